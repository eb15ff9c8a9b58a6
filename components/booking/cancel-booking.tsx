"use client";

import { cancelBookingAction } from "@/app/(app)/bookings/actions";
import { InlineAction } from "@/components/ui/inline-action";

export function CancelBooking({ bookingId, label }: { bookingId: string; label: string }) {
  return <InlineAction action={cancelBookingAction.bind(null, bookingId)} label="Cancel" pendingLabel="Cancelling…" ariaLabel={`Cancel ${label}`} />;
}
