import { addDays, addMonths, addYears } from "date-fns";
import type { Cadence } from "@/db/schema/inspections";

export type DueState = "due-soon" | "overdue";

/**
 * Calendar cadences and how early a check shows as "due soon" (common practice: a warning long
 * enough to plan the inspection). Before-each-use and after-a-modification checks have no calendar.
 */
const PERIODS: Partial<Record<Cadence, { next: (last: Date) => Date; warnDays: number }>> = {
  weekly: { next: (d) => addDays(d, 7), warnDays: 1 },
  monthly: { next: (d) => addMonths(d, 1), warnDays: 5 },
  yearly: { next: (d) => addYears(d, 1), warnDays: 30 },
};

export function hasCalendar(cadence: Cadence): boolean {
  return PERIODS[cadence] !== undefined;
}

/**
 * When a calendar inspection falls due after the last signed one, and whether it is due soon or
 * overdue at `now`. Never signed: overdue with no date (it should have been done before use).
 * Returns null when nothing is due yet, or the cadence has no calendar.
 */
export function dueState(cadence: Cadence, lastSignedAt: Date | null, now: Date): { state: DueState; dueAt: Date | null } | null {
  const period = PERIODS[cadence];
  if (!period) return null;
  if (!lastSignedAt) return { state: "overdue", dueAt: null };
  const dueAt = period.next(lastSignedAt);
  if (now >= dueAt) return { state: "overdue", dueAt };
  if (now >= addDays(dueAt, -period.warnDays)) return { state: "due-soon", dueAt };
  return null;
}
