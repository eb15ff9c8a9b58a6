import { describe, expect, it } from "vitest";
import { evaluateAsBuilt, type InstalledPart } from "@/lib/press/as-built";
import { componentsFromSizing } from "@/lib/press/from-sizing";
import type { ComponentSpec } from "@/lib/validation/component-spec";

let n = 0;
const part = (label: string, spec: ComponentSpec): InstalledPart => ({ id: String(++n), label, spec });
const core = (): InstalledPart[] => [
  part("Cylinder", { kind: "cylinder", boreMm: 100, rodMm: 50, strokeMm: 200, ratedPressureBar: 250, endFixity: "fixed-pinned" }),
  part("Pump", { kind: "pump", pumpKind: "single", flowLpm: 10, ratedPressureBar: 250 }),
  part("Relief", { kind: "relief-valve", settingBar: 200 }),
];
const figures = { workingPressureBar: 180, reliefPressureBar: null };

describe("as-built check", () => {
  it("computes the press from its installed parts: force = relief × cap area", () => {
    const r = evaluateAsBuilt(figures, core(), "metric");
    expect(r.ready).toBe(true);
    if (!r.ready) return;
    // computed from formula: π/4 · 100² mm² · 20 N/mm² = 157.08 kN
    expect(r.result.reliefForceKn).toBeCloseTo(157.08, 2);
    expect(r.input.pressureBar).toBe(180);
    expect(r.input.reliefBar).toBe(200);
  });

  it("says what is missing instead of guessing", () => {
    const r = evaluateAsBuilt(figures, [core()[0]!], "metric");
    expect(r).toMatchObject({ ready: false, missing: expect.arrayContaining(["a pump"]) });
  });

  it("fails a circuit with no relief valve, even when the press record names a relief pressure", () => {
    const parts = core().filter((p) => p.spec.kind !== "relief-valve");
    const r = evaluateAsBuilt({ workingPressureBar: 180, reliefPressureBar: 200 }, parts, "metric");
    expect(r.checks.find((c) => c.id === "relief-valve-present")?.level).toBe("fail");
  });

  it("rates only pressure-side hoses against the relief, and names the weakest one", () => {
    const parts = [
      ...core(),
      part("Return hose", { kind: "hose", line: "return", insideDiameterMm: 19, standard: "SAE 100R1AT", ratedPressureBar: 20, lengthMm: 1000 }),
      part("Strong hose", { kind: "hose", line: "pressure", insideDiameterMm: 12.7, standard: "SAE 100R2AT", ratedPressureBar: 276, lengthMm: 1000 }),
    ];
    const ok = evaluateAsBuilt(figures, parts, "metric");
    expect(ok.checks.find((c) => c.id === "rating-hose")?.level).toBe("ok");
    parts.push(part("Weak hose", { kind: "hose", line: "pressure", insideDiameterMm: 12.7, standard: "SAE 100R1AT", ratedPressureBar: 160, lengthMm: 1000 }));
    const bad = evaluateAsBuilt(figures, parts, "metric");
    expect(bad.checks.find((c) => c.id === "rating-hose")).toMatchObject({ level: "fail", message: expect.stringMatching(/^Weak hose:/) });
  });

  it("counts parallel cylinders and warns when they differ", () => {
    const parts = [...core(), part("Second", { kind: "cylinder", boreMm: 80, rodMm: 40, strokeMm: 200, ratedPressureBar: 250, endFixity: "fixed-pinned" })];
    const r = evaluateAsBuilt(figures, parts, "metric");
    expect(r.ready && r.input.cylinders.count).toBe(2);
    expect(r.checks.find((c) => c.id === "cylinders-differ")?.level).toBe("warn");
  });

  it("flags a relief valve set above its own rating", () => {
    const parts = [...core().filter((p) => p.spec.kind !== "relief-valve"), part("Relief", { kind: "relief-valve", settingBar: 300, ratedPressureBar: 250 })];
    expect(evaluateAsBuilt(figures, parts, "metric").checks.find((c) => c.id === "relief-valve-rating")?.level).toBe("fail");
  });
});

describe("as-built check, second edition", () => {
  const twoRams = (): InstalledPart[] => [
    ...core(),
    part("Second", { kind: "cylinder", boreMm: 100, rodMm: 50, strokeMm: 200, ratedPressureBar: 250, endFixity: "fixed-pinned" }),
  ];

  it("is incomplete, listing what is missing, until frame, ratings and buckling are recorded", () => {
    const r = evaluateAsBuilt(figures, twoRams(), "metric");
    if (!r.ready) throw new Error("expected a ready check");
    expect(r.overall).toBe("incomplete");
    expect(r.missingChecks.map((m) => m.id)).toEqual(
      expect.arrayContaining(["rating-hose", "rating-valve", "plate-crosshead", "plate-bolster", "columns", "platen", "rod-buckling"]),
    );
  });

  it("checks a recorded platen and names it when it is thin", () => {
    const parts = [...twoRams(), part("Platen", { kind: "platen", rodSpacingMm: 400, dieWidthMm: 80, widthMm: 200, thicknessMm: 20, grade: "S235JR" })];
    const r = evaluateAsBuilt(figures, parts, "metric");
    if (!r.ready) throw new Error("expected a ready check");
    expect(r.input.platen).toMatchObject({ rodSpacingMm: 400, dieWidthMm: 80 });
    expect(r.checks.find((c) => c.id === "platen")?.level).toBe("fail");
    expect(r.overall).toBe("fail");
    expect(r.missingChecks.map((m) => m.id)).not.toContain("platen");
  });

  it("warns when a die's own limit is below the press's force at relief, naming the die and its gauge limit", () => {
    // Hand calculation: 157.08 kN at relief; a 100 kN die → 100 × 10,000 / 7,854 = 127.3 bar on the gauge
    const parts = [...core(), part("Drawing dies", { kind: "die", purpose: "Drawing out", maxForceKn: 100 })];
    const r = evaluateAsBuilt(figures, parts, "metric");
    const check = r.checks.find((c) => c.id === "die-limit-1");
    expect(check?.level).toBe("warn");
    expect(check?.message).toContain("Drawing dies");
    expect(check?.message).toContain("127 bar");
  });

  it("reads an open frame's throat from a frame member with the role throat", () => {
    const throat = part("Back", { kind: "frame-member", role: "throat", throatDepthMm: 150, lengthMm: 400, widthMm: 200, thicknessMm: 40, grade: "S355JR" });
    const r = evaluateAsBuilt(figures, [...core(), throat], "metric");
    if (!r.ready) throw new Error("expected a ready check");
    expect(r.input.throat).toEqual({ depthMm: 150, heightMm: 400, sectionDepthMm: 200, thicknessMm: 40, grade: "S355JR" });
    expect(r.checks.find((c) => c.id === "throat")).toBeDefined();
    expect(r.missingChecks.map((m) => m.id)).not.toContain("columns");
  });
});

describe("a planned press from a sizing", () => {
  it("carries the sizing's figures into components that evaluate to the same force", () => {
    const input = {
      cylinders: { count: 2, boreMm: 100, rodMm: 50, strokeMm: 250 },
      pump: { kind: "two-stage" as const, approachFlowLpm: 40, pressingFlowLpm: 8, unloadBar: 50 },
      pressureBar: 190,
      reliefBar: 200,
      motorKw: 5.5,
      ratings: { hoseBar: 276, gaugeBar: 250 },
      lines: { pressureIdMm: 12.7 },
      reservoir: { volumeL: 120 },
    };
    const parts = componentsFromSizing(input);
    expect(parts.map((p) => p.kind)).toEqual(["cylinder", "cylinder", "pump", "motor", "relief-valve", "hose", "reservoir", "gauge"]);
    expect(parts.every((p) => p.purchased === false)).toBe(true);
    const r = evaluateAsBuilt({ workingPressureBar: 190, reliefPressureBar: 200 }, parts.map((p, i) => ({ id: String(i), label: p.label, spec: p.spec })), "metric");
    expect(r.ready).toBe(true);
    // computed from formula: 2 × π/4 · 100² mm² · 20 N/mm² = 314.16 kN
    if (r.ready) expect(r.result.reliefForceKn).toBeCloseTo(314.16, 1);
  });
});
