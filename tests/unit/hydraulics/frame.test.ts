import { describe, expect, it } from "vitest";
import { convert } from "@/lib/units";
import { makeFormatter } from "@/lib/hydraulics/checks";
import {
  FRAME_MIN_SAFETY_FACTOR,
  centreLoadBeam,
  columnsCheck,
  evaluateColumns,
  evaluatePlate,
  plateCheck,
  plateSection,
} from "@/lib/hydraulics/frame";
import { yieldStrength } from "@/lib/hydraulics/steel";
import type { ColumnsInput, PlateInput } from "@/lib/hydraulics/types";
import { expectPrinted, expectRel, inToMm, lbfToKn, mmToIn, mpaToPsi, psiToMpa } from "./helpers";

const fmt = makeFormatter("metric");

describe("plate bending (reference §8)", () => {
  // 40,000 lbf at the centre of a 24 in span, two 1 × 6 in bars on edge: S = 12 in³, I = 36 in⁴
  const bars: PlateInput = {
    role: "crosshead",
    spanMm: inToMm(24),
    thicknessMm: inToMm(6),
    widthMm: inToMm(2),
    grade: "A36",
  };
  const section = plateSection(bars);
  const beam = centreLoadBeam(lbfToKn(40_000), bars.spanMm, section, psiToMpa(29e6));

  it("two bars on edge are a 2 in wide, 6 in deep section: S = b·t²/6, I = b·t³/12", () => {
    expectRel(section.sectionModulusMm3 / inToMm(1) ** 3, 12); // computed from formula (b)
    expectRel(section.inertiaMm4 / inToMm(1) ** 4, 36); // computed from formula (b)
  });

  it("M = 240,000 lbf·in, σ = 20,000 psi, deflection 0.0110 in", () => {
    // Source: [PD] piping-designer.com M = PL/4, δ = PL³/48EI (a); values computed from formula (b)
    expectRel(convert("force", beam.momentNmm, "N", "lbf") / inToMm(1), 240_000);
    expectRel(mpaToPsi(beam.stressMpa), 20_000);
    expectRel(mmToIn(beam.deflectionMm), 0.011035);
    expectPrinted(mmToIn(beam.deflectionMm), 0.011, 4);
  });

  it("safety factor 1.80 on 36 ksi: below 2, so never ok", () => {
    expectPrinted(convert("stress", 36, "ksi", "MPa") / beam.stressMpa, 1.8, 2); // computed from formula (b)
    const result = evaluatePlate(bars, lbfToKn(40_000));
    expect(result.safetyFactor).toBeLessThan(FRAME_MIN_SAFETY_FACTOR);
    expect(plateCheck(bars, result, fmt).level).toBe("fail");
  });

  it("a built-up section given by S and I gives the same stress as the plate form", () => {
    const given: PlateInput = { ...bars, widthMm: undefined, ...section };
    expectRel(evaluatePlate(given, 100).stressMpa, evaluatePlate(bars, 100).stressMpa, 1e-12);
  });

  it("passes at a factor of 2 or more and reports the deflection", () => {
    const strong: PlateInput = { role: "bolster", spanMm: 300, widthMm: 200, thicknessMm: 60, grade: "S355JR" };
    const result = evaluatePlate(strong, 200); // σ = 200e3·300/4 / (200·60²/6) = 125 MPa; 335/125 = 2.68
    expectRel(result.stressMpa, 125, 1e-12); // computed from formula (b)
    expect(result.momentKnM).toBeCloseTo(15, 12);
    const check = plateCheck(strong, result, fmt);
    expect(check.level).toBe("ok");
    expect(check.id).toBe("plate-bolster");
    expect(check.message).toContain("deflection");
  });

  it("warns beyond the yield table even when the factor is fine", () => {
    const thick: PlateInput = { role: "bolster", spanMm: 300, widthMm: 300, thicknessMm: 80, grade: "S235JR" };
    const result = evaluatePlate(thick, 100);
    expect(result.yieldTableCovers).toBe(false);
    expect(plateCheck(thick, result, fmt).level).toBe("warn");
  });
});

describe("yield by grade and thickness (trap 8)", () => {
  it.each([
    ["S235JR", 10, 235],
    ["S235JR", 16, 235],
    ["S235JR", 16.1, 225],
    ["S235JR", 40, 225],
    ["S235JR", 63, 215],
    ["S355JR", 12, 355],
    ["S355JR", 30, 345],
    ["S355JR", 50, 335],
    ["A36", 25, 250],
  ] as const)("%s at %s mm → %s MPa", (grade, t, mpa) => {
    // Source: [EN] readle.co.uk steel grades (a); [A36] steelcalculator.app (a)
    expect(yieldStrength(grade, t)).toEqual({ yieldMpa: mpa, covered: true });
  });

  it("A36 is 36 ksi / 250 MPa", () => {
    // Source: [A36] steelcalculator.app A36 properties (a), printed rounding
    expectPrinted(convert("stress", yieldStrength("A36", 10).yieldMpa, "MPa", "ksi"), 36, 0);
  });

  it("beyond 63 mm the thickest band is used and flagged", () => {
    expect(yieldStrength("S355JR", 64)).toEqual({ yieldMpa: 335, covered: false });
  });
});

describe("columns in tension", () => {
  it("two Ø1.25 in columns under a central 40,000 lbf carry 20,000 lbf each: 16.3 ksi", () => {
    const columns: ColumnsInput = { count: 2, diameterMm: inToMm(1.25), grade: "A36" };
    const result = evaluateColumns(columns, lbfToKn(40_000));
    expectRel(convert("force", result.loadPerColumnKn, "kN", "lbf"), 20_000, 1e-12); // computed from formula (b)
    expectRel(mpaToPsi(result.stressMpa), 16_297); // computed from formula (b)
    expectPrinted(mpaToPsi(result.stressMpa) / 1000, 16.3, 1);
    expect(columnsCheck(columns, result, fmt).level).toBe("ok"); // 250 / 112.4 = 2.22
  });

  it("fails below a factor of 2 on yield", () => {
    const columns: ColumnsInput = { count: 4, diameterMm: 20, grade: "S235JR" };
    const result = evaluateColumns(columns, 200); // 50 kN on 314 mm² = 159 MPa; 235/159 = 1.48
    expect(result.safetyFactor).toBeLessThan(2);
    expect(columnsCheck(columns, result, fmt).level).toBe("fail");
  });
});
