// The hour-meter jump rule (lib/press/hour-meter.ts). A meter counts running time, so it can
// advance at most by the wall-clock time between readings — 24 h a day (common practice; no
// published source needed: it is the definition of an hour meter), plus JUMP_SLACK_H.
import { describe, expect, it } from "vitest";
import { FIRST_READING_MAX_H, hourReadingProblem, JUMP_SLACK_H, maxHoursAt } from "@/lib/press/hour-meter";

const at = (iso: string) => new Date(`${iso}Z`);
const last = { hours: 1200, readAt: at("2026-03-01T08:00:00") };

describe("hourReadingProblem", () => {
  it("accepts a reading within the elapsed time", () => {
    expect(hourReadingProblem(last, 1208, at("2026-03-01T16:00:00"))).toBeNull();
    // A full day round the clock, plus the slack.
    expect(hourReadingProblem(last, 1200 + 24 + JUMP_SLACK_H, at("2026-03-02T08:00:00"))).toBeNull();
  });

  it("refuses a jump larger than the time that has passed, saying how much is possible", () => {
    const problem = hourReadingProblem(last, 1_000_000, at("2026-03-02T08:00:00"));
    expect(problem).toMatch(/only 24 h have passed/);
    expect(problem).toMatch(/at most 1225 h/);
    expect(problem).toMatch(/a manager can correct it/);
    expect(hourReadingProblem(last, 1226.1, at("2026-03-02T08:00:00"))).not.toBeNull();
  });

  it("refuses a reading lower than the last one", () => {
    expect(hourReadingProblem(last, 1199.9, at("2026-03-05T08:00:00"))).toMatch(/cannot go backwards: the last reading is 1200 h/);
  });

  it("bounds a first reading, and honours the meter's current value when there is no reading", () => {
    expect(hourReadingProblem(null, 5_000, at("2026-03-01T08:00:00"))).toBeNull();
    expect(hourReadingProblem(null, FIRST_READING_MAX_H + 1, at("2026-03-01T08:00:00"))).toMatch(/first reading/);
    expect(hourReadingProblem(null, 40, at("2026-03-01T08:00:00"), 50)).toMatch(/cannot go backwards: the last reading is 50 h/);
  });

  it("allows only the slack for a reading at the same instant or one dated before the last", () => {
    expect(maxHoursAt(last, last.readAt)).toBe(1200 + JUMP_SLACK_H);
    expect(maxHoursAt(last, at("2026-02-01T00:00:00"))).toBe(1200 + JUMP_SLACK_H);
  });

  it("refuses a reading that is not a finite, non-negative number", () => {
    expect(hourReadingProblem(null, Number.NaN, at("2026-03-01T08:00:00"))).not.toBeNull();
    expect(hourReadingProblem(null, -1, at("2026-03-01T08:00:00"))).not.toBeNull();
  });
});
