/**
 * The traps of hydraulics-reference.md, one by one, through the public engine. Module tests cover
 * the formulas; these make sure the whole evaluation does not fall into them.
 */
import { describe, expect, it } from "vitest";
import { convert, formatQuantity } from "@/lib/units";
import { evaluateSizing, gaugeTable, type SizingInput } from "@/lib/hydraulics";
import { expectRel, gpmToLpm, inToMm, psiToBar } from "./helpers";

// 4 in bore, 2 in rod, 2500 psi, 10 gpm, efficiency 0.875
const PRESS: SizingInput = {
  cylinders: { count: 1, boreMm: inToMm(4), rodMm: inToMm(2), strokeMm: inToMm(12) },
  pump: { kind: "single", flowLpm: gpmToLpm(10) },
  pressureBar: psiToBar(2500),
  overallEfficiency: 0.875,
};
const r = evaluateSizing(PRESS);

describe("traps", () => {
  it("1. three different tons, each labelled", () => {
    // Source: [TF] Wikipedia "Ton-force" (a); [EH] 15.7 short tons (a)
    expectRel(r.forceShortTons, 15.708);
    expectRel(r.forceTonnesForce, 14.25);
    expect(r.forceShortTons / r.forceTonnesForce).toBeCloseTo(2204.6226 / 2000, 6);
    expect(formatQuantity("force", r.forceKn, "imperial")).toBe("15.7 US tonf");
    expect(formatQuantity("force", r.forceKn, "metric", { unit: "tf" })).toBe("14.3 t(f)");
    expect(formatQuantity("force", r.forceKn, "metric", { unit: "longTon" })).toBe("14.0 UK tonf");
  });

  it("2. gauge pressure drives force; atmospheric is never added", () => {
    // 2500 psi gauge on 12.566 in² → 31,416 lbf exactly, not (2500 + 14.7) × A. computed from formula (b)
    expectRel(convert("force", r.forceKn, "kN", "lbf"), 2500 * Math.PI * 4, 1e-9);
    const first = gaugeTable({ cylinders: { count: 1, boreMm: inToMm(4) }, reliefBar: r.reliefBar, system: "imperial" })[0];
    expectRel(convert("force", first?.forceKn ?? 0, "kN", "lbf"), 100 * Math.PI * 4, 1e-9);
  });

  it("3. retract uses the annulus", () => {
    expectRel(convert("force", r.retractForceKn, "kN", "lbf"), 23_562); // computed from formula (b)
    expectRel(r.retractSpeedMmS / r.advanceSpeedMmS, 16 / 12, 1e-9);
  });

  it("4. efficiency is applied once", () => {
    // 10 gpm at 2500 psi = 14.583 hydraulic hp; at 87.5 % → 16.667 hp motor. computed from formula (b)
    expectRel(convert("power", r.motorRequiredKw, "kW", "hp"), (2500 * 10) / (1714.2857 * 0.875));
  });

  it("5. 1714 and 0.3208 are rounded: the engine uses exact factors", () => {
    const exactHp = (2500 * 10 * 231) / (12 * 33_000); // psi·gpm = lbf·in³/(in²·min); 33,000 ft·lbf/min per hp
    expectRel(convert("power", r.pressingPowerKw, "kW", "hp"), exactHp, 1e-9); // computed from formula (b)
    expect(Math.abs(convert("power", r.pressingPowerKw, "kW", "hp") - (2500 * 10) / 1714)).toBeGreaterThan(0.002);
  });

  it("6. published examples round π: 31,400 lbf printed, 31,416 computed", () => {
    // Source: [EH] ehow.com (a) uses π ≈ 3.14
    const lbf = convert("force", r.forceKn, "kN", "lbf");
    expect(Math.round(lbf)).toBe(31_416);
    expect(Math.round(lbf / 100) * 100).toBe(31_400);
  });

  it("7. fixed–fixed buckling never uses 0.25: the recommended design K is 0.65 (theory 0.5)", () => {
    const b = evaluateSizing({ ...PRESS, buckling: { endFixity: "fixed-fixed", exposedRodMm: 0 } }).buckling;
    expect(b?.kFactor).toBe(0.65); // Source: AISC 360-22 Commentary Table C-A-7.1 (a)
  });

  it("8. yield drops with plate thickness", () => {
    const plateAt = (thicknessMm: number): number | undefined =>
      evaluateSizing({ ...PRESS, plate: { role: "bolster", spanMm: 300, widthMm: 200, thicknessMm, grade: "S355JR" } }).plate?.yieldMpa;
    // Source: [EN] readle.co.uk (a)
    expect([plateAt(16), plateAt(40), plateAt(63)]).toEqual([355, 345, 335]);
  });

  it("9. hose rating is whatever the layline says: the engine takes it as given", () => {
    const withHose = (hoseBar: number): string | undefined =>
      evaluateSizing({ ...PRESS, ratings: { hoseBar } }).checks.find((c) => c.id === "rating-hose")?.level;
    expect(withHose(psiToBar(2400))).toBe("fail"); // a −16 100R2AT at 2400 psi (c) is below this 2500 psi relief
    expect(withHose(psiToBar(4000))).toBe("ok");
  });

  it("10. parallel cylinders share the load only when it is centred: the engine says so", () => {
    const twin = evaluateSizing({ ...PRESS, cylinders: { ...PRESS.cylinders, count: 2 } });
    expect(twin.checks.find((c) => c.id === "parallel-cylinders")?.message).toContain("off-centre");
    expect(r.checks.find((c) => c.id === "parallel-cylinders")).toBeUndefined();
  });
});
