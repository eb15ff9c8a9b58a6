/**
 * Booking rules without I/O: how long a slot may be, when it may start, whether it sits inside the
 * shop's opening hours, and which stretches of a day are still free. The overlap rule itself is
 * MariaDB's (the bookings table's WITHOUT OVERLAPS key), never checked here.
 */
import type { OpeningHours } from "@/db/schema/shops";
import { FieldError } from "./errors";
import { startOfLocalDay, toWallTime } from "./time-zone";

export const MIN_SLOT_MINUTES = 15;
export const MAX_SLOT_MINUTES = 8 * 60;
/** How far ahead a booking may be made. */
export const MAX_DAYS_AHEAD = 90;

export type Slot = { startsAt: Date; endsAt: Date };

/** A broken rule, with the field it belongs to (answered 400). */
export class SlotError extends FieldError {
  constructor(field: "startsAt" | "endsAt", message: string) {
    super(field, message);
    this.name = "SlotError";
  }
}

const minutes = (ms: number): number => ms / 60_000;

export function formatMinutes(m: number): string {
  return `${String(Math.floor(m / 60)).padStart(2, "0")}:${String(m % 60).padStart(2, "0")}`;
}

/** Throws SlotError for a slot that may not be booked at `now` in a shop with these hours. */
export function checkSlot(slot: Slot, now: Date, timeZone: string, hours: OpeningHours | null): void {
  const length = minutes(slot.endsAt.getTime() - slot.startsAt.getTime());
  if (length <= 0) throw new SlotError("endsAt", "The end must be after the start.");
  if (length < MIN_SLOT_MINUTES) throw new SlotError("endsAt", `Book at least ${MIN_SLOT_MINUTES} minutes.`);
  if (length > MAX_SLOT_MINUTES) throw new SlotError("endsAt", `Book at most ${MAX_SLOT_MINUTES / 60} hours at a time.`);
  // A minute's grace so a slot "starting now" typed a moment ago is not refused.
  if (slot.startsAt.getTime() < now.getTime() - 60_000) throw new SlotError("startsAt", "That time has already passed.");
  if (slot.startsAt.getTime() > now.getTime() + MAX_DAYS_AHEAD * 86_400_000) {
    throw new SlotError("startsAt", `Book at most ${MAX_DAYS_AHEAD} days ahead.`);
  }
  const outside = outsideOpeningHours(slot, timeZone, hours);
  if (outside) throw new SlotError("startsAt", outside);
}

/** Why the slot is outside the shop's opening hours, or null when it fits (or no hours are set). */
export function outsideOpeningHours(slot: Slot, timeZone: string, hours: OpeningHours | null): string | null {
  if (!hours) return null;
  const start = toWallTime(slot.startsAt, timeZone);
  const open = hours[start.weekday];
  if (!open) return "The shop is closed that day.";
  const dayStart = startOfLocalDay(slot.startsAt, timeZone);
  const from = minutes(slot.startsAt.getTime() - dayStart.getTime());
  const to = minutes(slot.endsAt.getTime() - dayStart.getTime());
  if (from < open.opens || to > open.closes) {
    return `The shop is open ${formatMinutes(open.opens)}–${formatMinutes(open.closes)} that day.`;
  }
  return null;
}

/**
 * Free stretches of one local day (the day starting at `dayStart`, `dayLength` ms long) between
 * the given bookings, inside the opening hours if set, and not before `now`. Stretches shorter
 * than the shortest bookable slot are left out.
 */
export function freeStretches(
  dayStart: Date,
  dayLength: number,
  booked: readonly Slot[],
  now: Date,
  timeZone: string,
  hours: OpeningHours | null,
): Slot[] {
  let from = dayStart.getTime();
  let to = from + dayLength;
  if (hours) {
    const open = hours[toWallTime(new Date(from + 12 * 3_600_000), timeZone).weekday];
    if (!open) return [];
    to = from + open.closes * 60_000;
    from = from + open.opens * 60_000;
  }
  from = Math.max(from, Math.ceil(now.getTime() / 300_000) * 300_000); // from the next 5 minutes
  const free: Slot[] = [];
  const sorted = [...booked].sort((a, b) => a.startsAt.getTime() - b.startsAt.getTime());
  let cursor = from;
  for (const b of sorted) {
    if (b.startsAt.getTime() > cursor) free.push({ startsAt: new Date(cursor), endsAt: new Date(Math.min(b.startsAt.getTime(), to)) });
    cursor = Math.max(cursor, b.endsAt.getTime());
    if (cursor >= to) break;
  }
  if (cursor < to) free.push({ startsAt: new Date(cursor), endsAt: new Date(to) });
  return free.filter((s) => minutes(s.endsAt.getTime() - s.startsAt.getTime()) >= MIN_SLOT_MINUTES);
}

type Due = { state: "due-soon" | "overdue" };

/**
 * Warnings for a slot (the booking still goes ahead): inspections overdue or falling due before
 * the slot ends; service tasks overdue, due by date before the slot ends, or due soon by hours
 * (hours run with use, so no date can be promised).
 */
export function slotWarnings(
  inspections: readonly (Due & { name: string; dueAt: Date | null })[],
  service: readonly (Due & { title: string; dueDate: Date | null; dueHours: number | null })[],
  slot: Slot,
): string[] {
  const before = (d: Date | null): boolean => d !== null && d.getTime() <= slot.endsAt.getTime();
  return [
    ...inspections
      .filter((i) => i.state === "overdue" || before(i.dueAt))
      .map((i) => (i.state === "overdue" ? `Inspection overdue: ${i.name}.` : `Inspection falls due before your slot ends: ${i.name}.`)),
    ...service
      .filter((s) => s.state === "overdue" || before(s.dueDate) || (s.dueDate === null && s.dueHours !== null))
      .map((s) => (s.state === "overdue" ? `Service overdue: ${s.title}.` : s.dueDate ? `Service falls due before your slot ends: ${s.title}.` : `Service due soon, at ${s.dueHours} h on the meter: ${s.title}.`)),
  ];
}
