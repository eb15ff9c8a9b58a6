import type { Metadata } from "next";
import { ComingNext } from "@/components/ui/coming-next";

export const metadata: Metadata = { title: "Bookings" };

export default function BookingsPage() {
  return (
    <ComingNext
      title="Bookings"
      intro="Time on a shared press, only when it is safe to use."
      points={[
        "Time slots per press, never two overlapping",
        "No bookings while a press is tagged out",
        "A warning when an inspection falls due before the slot",
        "A calendar file for the booker",
      ]}
    />
  );
}
