"use client";

import useSWR from "swr";
import { fetchJson } from "@/lib/fetch-json";
import { localDate, localTime } from "@/lib/time-zone";
import { CancelBooking } from "./cancel-booking";

type Booking = { id: string; startsAt: string | Date; endsAt: string | Date; holderName: string; mine: boolean; canCancel: boolean };
type Props = { pressId: string; from: string; to: string; days: string[]; timeZone: string; initial: Booking[] };

const DAY_NAMES = ["Mon", "Tue", "Wed", "Thu", "Fri", "Sat", "Sun"];

/** One press's week, day by day in the shop's zone; kept live with SWR so others' bookings appear. */
export function WeekView({ pressId, from, to, days, timeZone, initial }: Props) {
  const { data } = useSWR<{ bookings: Booking[] }>(`/api/presses/${pressId}/bookings?from=${encodeURIComponent(from)}&to=${encodeURIComponent(to)}`, fetchJson, {
    fallbackData: { bookings: initial },
    refreshInterval: 60_000,
  });
  const list = data?.bookings ?? [];
  return (
    <ol className="grid gap-2 md:grid-cols-7" data-testid="week-view">
      {days.map((day, i) => {
        const todays = list.filter((b) => localDate(new Date(b.startsAt), timeZone) === day);
        return (
          <li key={day} className="min-w-0 rounded-md bg-steel-50 p-2">
            <p className="text-xs font-semibold text-steel-700">
              {DAY_NAMES[i]} <span className="font-normal">{day.slice(5)}</span>
            </p>
            {todays.length === 0 ? <p className="mt-1 text-xs text-steel-500">Free</p> : null}
            <ul className="mt-1 flex flex-col gap-1">
              {todays.map((b) => {
                const label = `${localTime(new Date(b.startsAt), timeZone)}–${localTime(new Date(b.endsAt), timeZone)}`;
                return (
                  <li key={b.id} className={`rounded px-2 py-1 text-xs ring-1 ${b.mine ? "bg-oil-50 ring-oil-400" : "bg-white ring-steel-200"}`}>
                    <p className="font-mono">{label}</p>
                    <p className="truncate">{b.mine ? "You" : b.holderName}</p>
                    {b.canCancel ? <CancelBooking bookingId={b.id} label={`${day} ${label}`} /> : null}
                  </li>
                );
              })}
            </ul>
          </li>
        );
      })}
    </ol>
  );
}
