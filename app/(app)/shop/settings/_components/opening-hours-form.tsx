"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { FieldError } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import type { OpeningHours } from "@/db/schema/shops";
import { initialActionState } from "@/lib/action-state";
import { formatMinutes } from "@/lib/booking-rules";
import { WEEKDAY_NAMES } from "@/lib/validation/shop";
import { updateOpeningHoursAction } from "../actions";

/** Opening hours per weekday; with "limit" off, bookings may be made at any time. */
export function OpeningHoursForm({ hours }: { hours: OpeningHours | null }) {
  const [state, action, pending] = useActionState(updateOpeningHoursAction, initialActionState);
  const v = state.values;
  const checked = (key: string, fallback: boolean): boolean => (v ? v[key] === "on" : fallback);
  const time = (key: string, fallback: number | undefined): string => v?.[key] ?? (fallback === undefined ? "" : formatMinutes(fallback));
  return (
    <form action={action} className="flex flex-col gap-3" noValidate>
      <FormMessage message={state.message} tone={state.ok ? "success" : "error"} />
      <label className="flex items-center gap-2 text-sm font-medium">
        <input type="checkbox" name="limit" defaultChecked={checked("limit", hours !== null)} className="h-5 w-5" />
        Bookings only within these hours
      </label>
      <ul className="flex flex-col gap-2">
        {WEEKDAY_NAMES.map((day, i) => {
          const h = hours?.[i] ?? undefined;
          return (
            <li key={day} className="grid grid-cols-[5.75rem_minmax(0,1fr)_auto_minmax(0,1fr)] items-center gap-x-2 gap-y-1 text-sm">
              <label className="flex items-center gap-2">
                <input type="checkbox" name={`open-${i}`} defaultChecked={checked(`open-${i}`, hours ? Boolean(h) : i < 6)} className="h-5 w-5" />
                {day}
              </label>
              <input aria-label={`${day} opens`} type="time" name={`opens-${i}`} defaultValue={time(`opens-${i}`, h?.opens ?? 9 * 60)} className="min-h-10 w-full min-w-0 rounded-md border border-steel-300 px-1 text-sm" aria-describedby={`day-${i}-error`} />
              <span aria-hidden="true">–</span>
              <input aria-label={`${day} closes`} type="time" name={`closes-${i}`} defaultValue={time(`closes-${i}`, h?.closes ?? 18 * 60)} className="min-h-10 w-full min-w-0 rounded-md border border-steel-300 px-1 text-sm" aria-describedby={`day-${i}-error`} />
              <div className="col-span-4">
                <FieldError id={`day-${i}-error`} errors={state.fieldErrors?.[`day-${i}`]} />
              </div>
            </li>
          );
        })}
      </ul>
      <Button type="submit" disabled={pending} className="self-start">
        {pending ? "Saving…" : "Save opening hours"}
      </Button>
    </form>
  );
}
