import { TZDate } from "@date-fns/tz";
import { format } from "date-fns";

/** A due date as the shop reads it, e.g. "14 Mar 2026", in the shop's time zone. */
export function formatInTimeZone(instant: Date, timeZone: string): string {
  return format(new TZDate(instant.getTime(), timeZone), "d MMM yyyy");
}

/** A local date (YYYY-MM-DD) as the shop reads it. */
export function formatLocalDate(isoDate: string): string {
  const [y, m, d] = isoDate.split("-").map(Number) as [number, number, number];
  return format(new Date(y, m - 1, d), "d MMM yyyy");
}
