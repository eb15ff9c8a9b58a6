import { describe, expect, it } from "vitest";
import { pressStatus, unusableReason, type StatusInput } from "@/lib/status";

const LIFECYCLES = ["planned", "building", "in-service", "retired"] as const;
const TAG_OUTS: Record<string, StatusInput["tagOuts"]> = {
  none: [],
  problem: [{ source: "problem", reason: "Pressure hose weeping at the cap-end fitting" }],
  inspection: [{ source: "inspection", reason: "Relief valve did not open at its setting" }],
  manual: [{ source: "manual", reason: "Pump rebuild in progress" }],
  several: [
    { source: "manual", reason: "Pump rebuild in progress" },
    { source: "problem", reason: "Crack at the crosshead weld" },
  ],
};
const due = new Date("2026-03-01T00:00:00Z");
const INSPECTIONS: Record<string, StatusInput["inspectionsDue"]> = {
  none: [],
  soon: [{ name: "Monthly frame check", state: "due-soon", dueAt: due }],
  overdue: [{ name: "Monthly frame check", state: "overdue", dueAt: due }],
};
const SERVICE: Record<string, StatusInput["serviceDue"]> = {
  none: [],
  soon: [{ title: "Change filter element", state: "due-soon", dueDate: null, dueHours: 250 }],
  overdue: [{ title: "Change filter element", state: "overdue", dueDate: due, dueHours: null }],
};

describe("pressStatus", () => {
  // Every combination of the inputs that can change the answer: 4 lifecycles × 5 tag-out sets ×
  // 3 inspection states × 3 service states = 180 cases, each against the precedence rule written out.
  for (const lifecycle of LIFECYCLES) {
    for (const [tagName, tagOuts] of Object.entries(TAG_OUTS)) {
      for (const [inspName, inspectionsDue] of Object.entries(INSPECTIONS)) {
        for (const [svcName, serviceDue] of Object.entries(SERVICE)) {
          it(`${lifecycle} / tag-outs ${tagName} / inspection ${inspName} / service ${svcName}`, () => {
            const status = pressStatus({ lifecycle, tagOuts, inspectionsDue, serviceDue });
            const expected =
              lifecycle !== "in-service"
                ? "not-in-service"
                : tagOuts.length > 0
                  ? "tagged-out"
                  : inspName === "overdue"
                    ? "inspection-overdue"
                    : svcName === "overdue"
                      ? "service-due"
                      : "ready";
            expect(status.code).toBe(expected);
            expect(status.usable).toBe(expected !== "not-in-service" && expected !== "tagged-out");
            expect(status.reasons.length > 0).toBe(expected !== "ready");
            // Nothing is lost: every concern shows as a reason or a note.
            const concerns = (lifecycle !== "in-service" ? 1 : 0) + tagOuts.length + inspectionsDue.length + serviceDue.length;
            expect(status.reasons.length + status.notes.length).toBe(concerns);
          });
        }
      }
    }
  }

  it("says why in plain words, one reason per tag-out", () => {
    const status = pressStatus({ lifecycle: "in-service", tagOuts: TAG_OUTS.several!, inspectionsDue: [], serviceDue: [] });
    expect(status.label).toBe("Tagged out");
    expect(status.reasons).toEqual(["Tag-out: Pump rebuild in progress", "Stop-use problem reported: Crack at the crosshead weld"]);
    expect(unusableReason(status)).toBe("Tagged out — Tag-out: Pump rebuild in progress; Stop-use problem reported: Crack at the crosshead weld");
  });

  it("names the failed inspection item and the lifecycle", () => {
    expect(pressStatus({ lifecycle: "in-service", tagOuts: TAG_OUTS.inspection!, inspectionsDue: [], serviceDue: [] }).reasons).toEqual([
      "Failed critical inspection item: Relief valve did not open at its setting",
    ]);
    expect(pressStatus({ lifecycle: "retired", tagOuts: [], inspectionsDue: [], serviceDue: [] }).reasons).toEqual(["This press is retired."]);
  });

  it("keeps lesser concerns as notes with their dates and hours", () => {
    const status = pressStatus({ lifecycle: "in-service", tagOuts: [], inspectionsDue: INSPECTIONS.overdue!, serviceDue: SERVICE.soon! });
    expect(status.reasons).toEqual(["Inspection overdue: Monthly frame check (2026-03-01)"]);
    expect(status.notes).toEqual(["Service due soon: Change filter element (at 250 h)"]);
    expect(unusableReason(status)).toBeNull();
  });

  it("is ready with nothing due", () => {
    expect(pressStatus({ lifecycle: "in-service", tagOuts: [], inspectionsDue: [], serviceDue: [] })).toEqual({
      code: "ready",
      label: "Ready",
      reasons: [],
      notes: [],
      usable: true,
    });
  });
});
