"use client";

import { useActionState } from "react";
import { bookPressAction } from "@/app/(app)/bookings/actions";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SelectField } from "@/components/ui/select-field";
import { initialActionState } from "@/lib/action-state";

type Props = {
  /** One press (fixed) or several to choose from. */
  presses: readonly { id: string; name: string }[];
  defaultPressId?: string;
  /** Today's date in the shop's zone, "YYYY-MM-DD". */
  today: string;
  timeZone: string;
};

/** Books a slot: a date and a start and end time, in the shop's time zone. */
export function BookingForm({ presses, defaultPressId, today, timeZone }: Props) {
  const [state, action, pending] = useActionState(bookPressAction, initialActionState);
  const v = (key: string, fallback = ""): string => (state.ok && key !== "pressId" ? fallback : (state.values?.[key] ?? fallback));
  return (
    <form action={action} className="flex flex-col gap-3" noValidate data-testid="booking-form">
      <FormMessage message={state.message} tone={state.ok ? "success" : "error"} />
      {presses.length === 1 ? (
        <input type="hidden" name="pressId" value={presses[0]!.id} />
      ) : (
        <SelectField
          name="pressId"
          label="Press"
          options={presses.map((p) => ({ value: p.id, label: p.name }))}
          defaultValue={v("pressId", defaultPressId ?? presses[0]?.id ?? "")}
          errors={state.fieldErrors?.pressId}
        />
      )}
      <Field name="date" label="Date" type="date" min={today} defaultValue={v("date", today)} errors={state.fieldErrors?.date} required />
      <div className="grid grid-cols-2 gap-3">
        <Field name="from" label="From" type="time" step={300} defaultValue={v("from")} errors={state.fieldErrors?.from} required />
        <Field name="to" label="To" type="time" step={300} defaultValue={v("to")} errors={state.fieldErrors?.to} required />
      </div>
      <p className="text-xs text-steel-500">Times in {timeZone}.</p>
      <Button type="submit" disabled={pending} className="self-start">
        {pending ? "Booking…" : "Book"}
      </Button>
    </form>
  );
}
