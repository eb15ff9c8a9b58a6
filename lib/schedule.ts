/**
 * Due / overdue computation for the service plan: pure, no I/O. A task falls due after
 * `intervalDays` calendar days in the shop's time zone and/or `intervalHours` on the hour meter,
 * whichever comes first. Days are counted on local calendar dates (never as 24-hour blocks), so a
 * daylight-saving change moves no due date, and a month end is just another date.
 */
import { TZDate } from "@date-fns/tz";
import { addDays, differenceInCalendarDays } from "date-fns";
import { localDate } from "./time-zone";

export type IntervalTask = {
  intervalDays: number | null;
  intervalHours: number | null;
  /** Local date (YYYY-MM-DD) the interval counts from: the last completion or the task's start. */
  lastDoneOn: string;
  /** Hour-meter reading the interval counts from. */
  lastDoneHours: number;
};

export type DueState = "ok" | "due-soon" | "overdue";

export type TaskDue = {
  state: DueState;
  /** Local date the days interval ends on (due that day, overdue the day after). */
  dueOn: string | null;
  /** The instant that local date starts in the shop's zone. */
  dueDate: Date | null;
  dueHours: number | null;
  daysLeft: number | null;
  hoursLeft: number | null;
};

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

function parts(isoDate: string): [number, number, number] {
  const m = ISO_DATE.exec(isoDate);
  if (!m) throw new RangeError(`Not a date: ${isoDate}`);
  return [Number(m[1]), Number(m[2]), Number(m[3])];
}

/** A plain calendar date as a zone-free Date at UTC midnight, for date-only arithmetic. */
function calendar(isoDate: string): Date {
  const [y, m, d] = parts(isoDate);
  return new Date(Date.UTC(y, m - 1, d));
}

function isoOf(calendarDate: Date): string {
  return calendarDate.toISOString().slice(0, 10);
}

// The local date of an instant has one implementation, with the other zone conversions.
export { localDate };

/** The instant a local date begins in a time zone (handles zones whose offset changes that day). */
export function startOfLocalDay(isoDate: string, timeZone: string): Date {
  const [y, m, d] = parts(isoDate);
  return new Date(new TZDate(y, m - 1, d, timeZone).getTime());
}

/** Calendar arithmetic on local dates: 31 Jan + 30 days is 2 Mar (1 Mar in a leap year). */
export function addLocalDays(isoDate: string, days: number): string {
  return isoOf(addDays(calendar(isoDate), days));
}

export function daysBetween(fromIso: string, toIso: string): number {
  return differenceInCalendarDays(calendar(toIso), calendar(fromIso));
}

/** The "due soon" warning window: a tenth of the interval, at least 1 day / 1 h, at most 14 days / 25 h. */
export function dueSoonWindow(task: Pick<IntervalTask, "intervalDays" | "intervalHours">): { days: number | null; hours: number | null } {
  return {
    days: task.intervalDays ? Math.min(14, Math.max(1, Math.ceil(task.intervalDays / 10))) : null,
    hours: task.intervalHours ? Math.min(25, Math.max(1, task.intervalHours / 10)) : null,
  };
}

/** Where a task stands now, given the press's current hour-meter reading. */
export function taskDue(task: IntervalTask, at: { now: Date; hours: number; timeZone: string }): TaskDue {
  const today = localDate(at.now, at.timeZone);
  const dueOn = task.intervalDays ? addLocalDays(task.lastDoneOn, task.intervalDays) : null;
  const dueHours = task.intervalHours ? task.lastDoneHours + task.intervalHours : null;
  const daysLeft = dueOn ? daysBetween(today, dueOn) : null;
  const hoursLeft = dueHours !== null ? roundHours(dueHours - at.hours) : null;
  const soon = dueSoonWindow(task);
  let state: DueState = "ok";
  if ((daysLeft !== null && daysLeft < 0) || (hoursLeft !== null && hoursLeft < 0)) state = "overdue";
  else if ((daysLeft !== null && soon.days !== null && daysLeft <= soon.days) || (hoursLeft !== null && soon.hours !== null && hoursLeft <= soon.hours)) {
    state = "due-soon";
  }
  return { state, dueOn, dueDate: dueOn ? startOfLocalDay(dueOn, at.timeZone) : null, dueHours, daysLeft, hoursLeft };
}

/**
 * A completing log entry restarts the interval from its date and reading. An entry dated before
 * the current start (a late back-filled record) changes nothing.
 */
export function completeTask<T extends IntervalTask>(task: T, entry: { performedOn: string; hours: number }): T {
  if (daysBetween(task.lastDoneOn, entry.performedOn) < 0) return task;
  return { ...task, lastDoneOn: entry.performedOn, lastDoneHours: Math.max(entry.hours, 0) };
}

/** Overdue first, then the least time or hours left (as a share of the interval). */
export function compareDue(a: { due: TaskDue; task: IntervalTask }, b: { due: TaskDue; task: IntervalTask }): number {
  const rank = { overdue: 0, "due-soon": 1, ok: 2 } as const;
  return rank[a.due.state] - rank[b.due.state] || urgency(a) - urgency(b);
}

function urgency({ due, task }: { due: TaskDue; task: IntervalTask }): number {
  const shares = [
    due.daysLeft !== null && task.intervalDays ? due.daysLeft / task.intervalDays : Infinity,
    due.hoursLeft !== null && task.intervalHours ? due.hoursLeft / task.intervalHours : Infinity,
  ];
  return Math.min(...shares);
}

// Hour-meter figures are decimals; keep 0.1 h + 0.2 h from reading as 0.30000000000000004.
function roundHours(h: number): number {
  return Math.round(h * 1000) / 1000;
}
