import { describe, expect, it } from "vitest";
import { entryFromForm, partsFromText } from "@/lib/service/entry-form";
import { parsePlanPost, serviceEntryInputSchema, serviceEntryPatchSchema } from "@/lib/validation/service";

describe("service entry schema", () => {
  it("accepts a filter change and a relief check", () => {
    expect(serviceEntryInputSchema.safeParse({ kind: "filter-changed", performedOn: "2026-03-01", hours: 120 }).success).toBe(true);
    expect(serviceEntryInputSchema.safeParse({ kind: "relief-checked", performedOn: "2026-03-01", reliefFoundBar: 205, reliefSetBar: 200 }).success).toBe(true);
  });
  it("names the field of each problem", () => {
    const keys = (body: unknown) => {
      const r = serviceEntryInputSchema.safeParse(body);
      return r.success ? [] : r.error.issues.map((i) => i.path.join("."));
    };
    expect(keys({ kind: "oil-sample", performedOn: "2026-03-01", iso4406: "14/16/18" })).toEqual(["iso4406"]);
    expect(keys({ kind: "filter-changed", performedOn: "2026-03-01", iso4406: "18/16/13" })).toEqual(["iso4406"]);
    expect(keys({ kind: "hose-replaced", performedOn: "2026-03-01" })).toEqual(["componentId"]);
    expect(keys({ kind: "filter-changed", performedOn: "1 March", hours: -1 }).sort()).toEqual(["hours", "performedOn"]);
    expect(keys({ kind: "filter-changed", performedOn: "2026-03-01", colour: "red" })).toEqual([""]);
    expect(serviceEntryPatchSchema.safeParse({ kind: "other" }).success).toBe(false);
  });
  it("reads the plan POST as a starting plan or a task with at least one interval", () => {
    expect(parsePlanPost({ startingPlan: true })).toEqual({ startingPlan: true });
    expect(() => parsePlanPost({ startingPlan: true, extra: 1 })).toThrow();
    expect(() => parsePlanPost({ title: "Grease", kind: "other" })).toThrow(/interval/);
    expect(parsePlanPost({ title: "Grease", kind: "other", intervalHours: 50 })).toMatchObject({ intervalHours: 50 });
  });
});

describe("service form values", () => {
  it("reads parts one per line with an optional count", () => {
    expect(partsFromText("2 × filter element\n\n1x O-ring kit\nbreather cap")).toEqual([
      { quantity: 2, description: "filter element" },
      { quantity: 1, description: "O-ring kit" },
      { quantity: 1, description: "breather cap" },
    ]);
  });
  it("converts a relief setting typed in psi to bar", () => {
    const input = entryFromForm({ kind: "relief-checked", performedOn: "2026-03-01", reliefFound: "2900", cost: "12.50" }, "imperial");
    // 2900 psi × 0.0689476 bar/psi = 199.95 bar (exact psi in lib/units.ts).
    expect(input.reliefFoundBar as number).toBeCloseTo(199.948, 2);
    expect(input.costCents).toBe(1250);
  });
});
