/**
 * Wall-clock time in a shop's IANA time zone ↔ UTC instants, with the platform's Intl data only.
 * Times are stored in UTC and shown in the shop's zone (product.md, Data rules).
 */

export type WallTime = { year: number; month: number; day: number; hour: number; minute: number };

const formatters = new Map<string, Intl.DateTimeFormat>();

function formatter(timeZone: string): Intl.DateTimeFormat {
  let f = formatters.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat("en-US", {
      timeZone,
      hourCycle: "h23",
      year: "numeric",
      month: "2-digit",
      day: "2-digit",
      hour: "2-digit",
      minute: "2-digit",
      second: "2-digit",
      weekday: "short",
    });
    formatters.set(timeZone, f);
  }
  return f;
}

const WEEKDAYS = ["Mon", "Tue", "Wed", "Thu", "Fri", "Sat", "Sun"];

/** The wall-clock time of an instant in a zone, with the weekday (0 = Monday … 6 = Sunday). */
export function toWallTime(instant: Date, timeZone: string): WallTime & { weekday: number; second: number } {
  const parts = Object.fromEntries(formatter(timeZone).formatToParts(instant).map((p) => [p.type, p.value]));
  return {
    year: Number(parts.year),
    month: Number(parts.month),
    day: Number(parts.day),
    hour: Number(parts.hour),
    minute: Number(parts.minute),
    second: Number(parts.second),
    weekday: WEEKDAYS.indexOf(parts.weekday ?? ""),
  };
}

/** Offset of the zone from UTC at an instant, in minutes (east positive). */
export function zoneOffsetMinutes(instant: Date, timeZone: string): number {
  const w = toWallTime(instant, timeZone);
  const asUtc = Date.UTC(w.year, w.month - 1, w.day, w.hour, w.minute, w.second);
  return Math.round((asUtc - Math.floor(instant.getTime() / 1000) * 1000) / 60_000);
}

/**
 * The instant of a wall-clock time in a zone. In a gap (clocks spring forward) the time is moved
 * forward by the gap; in an overlap (clocks fall back) the earlier instant is taken.
 */
export function fromWallTime(wall: WallTime, timeZone: string): Date {
  const naive = Date.UTC(wall.year, wall.month - 1, wall.day, wall.hour, wall.minute);
  // The zone's offsets around that day (a clock change moves it at most once within ±14 h).
  const offsets = new Set([-14, 0, 14].map((h) => zoneOffsetMinutes(new Date(naive + h * 3_600_000), timeZone)));
  const candidates = [...offsets].map((o) => ({ o, t: naive - o * 60_000 }));
  const valid = candidates.filter(({ o, t }) => zoneOffsetMinutes(new Date(t), timeZone) === o).map(({ t }) => t);
  return new Date(valid.length > 0 ? Math.min(...valid) : Math.max(...candidates.map(({ t }) => t)));
}

/** Midnight (start of the local day) of the day `days` after the one containing `instant`. */
export function startOfLocalDay(instant: Date, timeZone: string, days = 0): Date {
  const w = toWallTime(instant, timeZone);
  const d = new Date(Date.UTC(w.year, w.month - 1, w.day + days));
  return fromWallTime({ year: d.getUTCFullYear(), month: d.getUTCMonth() + 1, day: d.getUTCDate(), hour: 0, minute: 0 }, timeZone);
}

/** "YYYY-MM-DD" of the local day containing the instant. */
export function localDate(instant: Date, timeZone: string): string {
  const w = toWallTime(instant, timeZone);
  return `${w.year}-${String(w.month).padStart(2, "0")}-${String(w.day).padStart(2, "0")}`;
}

/** "HH:MM" local time of the instant. */
export function localTime(instant: Date, timeZone: string): string {
  const w = toWallTime(instant, timeZone);
  return `${String(w.hour).padStart(2, "0")}:${String(w.minute).padStart(2, "0")}`;
}

/** Parses "YYYY-MM-DD" and "HH:MM" typed in a form as wall time in the zone; null when malformed. */
export function parseLocal(date: string, time: string, timeZone: string): Date | null {
  const d = /^(\d{4})-(\d{2})-(\d{2})$/.exec(date);
  const t = /^(\d{2}):(\d{2})$/.exec(time);
  if (!d || !t) return null;
  const wall = { year: Number(d[1]), month: Number(d[2]), day: Number(d[3]), hour: Number(t[1]), minute: Number(t[2]) };
  if (wall.month < 1 || wall.month > 12 || wall.day < 1 || wall.day > 31 || wall.hour > 23 || wall.minute > 59) return null;
  return fromWallTime(wall, timeZone);
}

/** "2026-07-15 09:00–11:00 (Europe/London)" */
export function slotText(slot: { startsAt: Date; endsAt: Date }, timeZone: string): string {
  const sameDay = localDate(slot.startsAt, timeZone) === localDate(slot.endsAt, timeZone);
  const end = sameDay ? localTime(slot.endsAt, timeZone) : `${localDate(slot.endsAt, timeZone)} ${localTime(slot.endsAt, timeZone)}`;
  return `${localDate(slot.startsAt, timeZone)} ${localTime(slot.startsAt, timeZone)}–${end} (${timeZone})`;
}
