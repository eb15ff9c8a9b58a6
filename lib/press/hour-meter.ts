/**
 * The one rule for how far an hour meter may move (hardening #4). Pure.
 * A meter counts running time, so between two readings it can advance at most by the time that
 * has passed (24 h a day), plus a little slack for a reading rounded up and clocks that disagree.
 * Without this, one absurd reading (1,000,000 h) would be accepted and every true reading after it
 * refused as lower. A first reading has nothing to compare with and is bounded by FIRST_READING_MAX_H.
 */
export const MS_PER_HOUR = 3_600_000;
/** Slack over the elapsed time, in hours. Common practice: meters are read to the tenth or the whole hour. */
export const JUMP_SLACK_H = 1;
/** A first reading above this (≈ 23 years of running round the clock) is refused as implausible. */
export const FIRST_READING_MAX_H = 200_000;

export type LastReading = { hours: number; readAt: Date };

const fmt = (h: number): string => String(Number(h.toFixed(1)));

/** Largest reading allowed at `at` after `last`. */
export function maxHoursAt(last: LastReading | null, at: Date): number {
  if (!last) return FIRST_READING_MAX_H;
  const elapsedH = Math.max(0, (at.getTime() - last.readAt.getTime()) / MS_PER_HOUR);
  return last.hours + elapsedH + JUMP_SLACK_H;
}

/**
 * Why `hours` cannot be recorded at `at` after `last`, or null when it can. `floorH` is the meter's
 * current value when there is no reading to compare with (a press entered with hours already on it).
 */
export function hourReadingProblem(last: LastReading | null, hours: number, at: Date, floorH = 0): string | null {
  if (!Number.isFinite(hours) || hours < 0) return "Enter the hour-meter reading in hours (0 or more).";
  const floor = last?.hours ?? floorH;
  if (hours < floor) return `The hour meter cannot go backwards: the last reading is ${fmt(floor)} h.`;
  const max = maxHoursAt(last, at);
  if (hours <= max) return null;
  if (!last) return `${fmt(hours)} h is more than any press runs (at most ${fmt(FIRST_READING_MAX_H)} h for a first reading). Check the reading.`;
  const elapsedH = Math.max(0, (at.getTime() - last.readAt.getTime()) / MS_PER_HOUR);
  return (
    `${fmt(hours)} h is ${fmt(hours - last.hours)} h more than the last reading (${fmt(last.hours)} h, ${last.readAt.toISOString().slice(0, 16).replace("T", " ")} UTC), ` +
    `but only ${fmt(elapsedH)} h have passed since then, so the meter can show at most ${fmt(max)} h now. ` +
    "Check the reading; if an earlier reading was wrong, a manager can correct it."
  );
}
