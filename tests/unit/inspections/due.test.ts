import { describe, expect, it } from "vitest";
import { dueState } from "@/lib/inspections/due";
import { signOffProblems } from "@/lib/inspections/rules";

const at = (iso: string) => new Date(iso);

describe("inspection due dates (calendar cadences, common practice warning windows)", () => {
  it("is overdue with no date when never signed, and nothing for cadences without a calendar", () => {
    expect(dueState("monthly", null, at("2026-12-01T00:00:00Z"))).toEqual({ state: "overdue", dueAt: null });
    expect(dueState("pre-use", null, at("2026-12-01T00:00:00Z"))).toBeNull();
    expect(dueState("after-modification", at("2026-01-01T00:00:00Z"), at("2026-12-01T00:00:00Z"))).toBeNull();
  });

  it("counts a month and a year by the calendar and warns a few days before", () => {
    const last = at("2026-01-31T10:00:00Z");
    // date-fns addMonths clamps 31 January to the last day of February.
    expect(dueState("monthly", last, at("2026-02-20T00:00:00Z"))).toBeNull();
    expect(dueState("monthly", last, at("2026-02-24T00:00:00Z"))?.state).toBe("due-soon");
    expect(dueState("monthly", last, at("2026-03-01T00:00:00Z"))).toEqual({ state: "overdue", dueAt: at("2026-02-28T10:00:00Z") });
    expect(dueState("weekly", at("2026-03-01T08:00:00Z"), at("2026-03-07T09:00:00Z"))?.state).toBe("due-soon");
    expect(dueState("yearly", at("2025-06-01T08:00:00Z"), at("2026-05-10T08:00:00Z"))?.state).toBe("due-soon");
  });
});

describe("sign-off readiness", () => {
  const item = { key: "welds", text: "No cracks at welds", photoOnFail: true, answerId: "a1" };
  it("lists unanswered items, failures without notes and missing photos", () => {
    expect(signOffProblems([{ ...item, outcome: null, note: null }], new Set())).toEqual(["1 item is not answered yet."]);
    expect(signOffProblems([{ ...item, outcome: "fail", note: "Crack at gusset" }], new Set())).toEqual(["“No cracks at welds” failed: add a photo of it."]);
    expect(signOffProblems([{ ...item, outcome: "fail", note: "Crack at gusset" }], new Set(["a1"]))).toEqual([]);
    expect(signOffProblems([{ ...item, outcome: "pass", note: null }], new Set())).toEqual([]);
  });
});
