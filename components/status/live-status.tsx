"use client";

import useSWR from "swr";
import { StatusBadge, StatusReasons } from "@/components/ui/status-badge";
import type { PublicStatus } from "@/lib/data/status-page";
import { fetchJson } from "@/lib/fetch-json";
import { localTime } from "@/lib/time-zone";

/** The status at the press, refreshed every 30 s and when the phone comes back to the page. */
export function LiveStatus({ token, initial }: { token: string; initial: PublicStatus }) {
  const { data, error } = useSWR<PublicStatus>(`/api/status/${token}`, fetchJson, { fallbackData: initial, refreshInterval: 30_000, revalidateOnFocus: true });
  const s = data ?? initial;
  const time = (iso: string): string => localTime(new Date(iso), s.timeZone);
  // A free stretch that runs to midnight reads better as "24:00" than as "00:00".
  const until = (iso: string): string => (time(iso) === "00:00" ? "24:00" : time(iso));
  return (
    <div className="flex flex-col gap-5" data-testid="live-status">
      <div>
        <StatusBadge status={s.status} large />
        <StatusReasons status={s.status} />
      </div>
      <section aria-labelledby="free-heading">
        <h2 id="free-heading" className="text-base font-semibold">
          Free time
        </h2>
        {s.status.usable ? (
          <dl className="mt-2 grid gap-3 sm:grid-cols-2" data-testid="free-slots">
            {s.days.map((d) => (
              <div key={d.date} className="rounded-md bg-steel-50 p-3">
                <dt className="text-sm font-medium">
                  {d.label} <span className="font-normal text-steel-600">{d.date}</span>
                </dt>
                <dd className="mt-1 text-sm">
                  {d.free.length === 0 ? "Fully booked or closed." : d.free.map((f) => `${time(f.startsAt)}–${until(f.endsAt)}`).join(", ")}
                </dd>
              </div>
            ))}
          </dl>
        ) : (
          <p className="mt-2 text-sm text-steel-700">Not bookable until it is back in use.</p>
        )}
        <p className="mt-2 text-xs text-steel-500">
          Times in {s.timeZone}. Checked {time(s.checkedAt)}
          {error ? " — could not refresh; check your connection." : "."}
        </p>
      </section>
    </div>
  );
}
