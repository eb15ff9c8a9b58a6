import { describe, expect, it } from "vitest";
import { SizingInputError, evaluateSizing, findInputProblems, type SizingInput } from "@/lib/hydraulics";
import { annulusAreaMm2, circleAreaMm2 } from "@/lib/hydraulics/force";
import { expectRel } from "./helpers";
import { FULL_SIZING_INPUT } from "../../fixtures/sizing-inputs";

const BASE: SizingInput = {
  cylinders: { count: 1, boreMm: 100, rodMm: 50, strokeMm: 300 },
  pump: { kind: "single", flowLpm: 12 },
  pressureBar: 200,
};

const FULL = FULL_SIZING_INPUT;

const levelOf = (input: SizingInput, id: string): string | undefined =>
  evaluateSizing(input).checks.find((c) => c.id === id)?.level;

describe("evaluateSizing: the core figures", () => {
  const r = evaluateSizing(BASE);
  const cap = circleAreaMm2(100);
  const annulus = annulusAreaMm2(100, 50);

  it("force at working pressure in kN and both tons; relief defaults to working", () => {
    // computed from formula (b): 200 bar on 7854 mm² = 157.08 kN
    expectRel(r.forceKn, (200 * cap) / 10_000, 1e-12);
    expectRel(r.forceTonnesForce, r.forceKn / 9.80665, 1e-12);
    expectRel(r.forceShortTons, (r.forceKn * 1000) / 4.4482216152605 / 2000, 1e-12);
    expect(r.reliefBar).toBe(200);
    expect(r.reliefForceKn).toBe(r.forceKn);
    expectRel(r.retractForceKn, (200 * annulus) / 10_000, 1e-12);
  });

  it("speeds: single pump gives the same advance and pressing speed; retract on the annulus", () => {
    expectRel(r.advanceSpeedMmS, (12e6 / 60) / cap, 1e-12); // computed from formula (b)
    expect(r.pressingSpeedMmS).toBe(r.advanceSpeedMmS);
    expectRel(r.retractSpeedMmS, (12e6 / 60) / annulus, 1e-12);
    expect(r.cycleTimeS).toBeUndefined();
  });

  it("power and motor: single pump at relief, efficiency 0.85 by default", () => {
    expectRel(r.pressingPowerKw, (200 * 12) / 600, 1e-12); // computed from formula (b)
    expectRel(r.motorRequiredKw, (200 * 12) / 600 / 0.85, 1e-12);
    expect(r.governingStage).toBe("pressing");
    expect(r.maxPressureForMotorBar).toBeUndefined();
  });

  it("without optional blocks: only the cross-cutting checks, the relief an assumption, the design incomplete", () => {
    expect(r.checks.map((c) => c.id)).toEqual(["relief-vs-working", "efficiency-range"]);
    expect(r.checks[0]?.level).toBe("warn");
    expect(r.assumptions).toHaveLength(1);
    expect(r.missing.map((m) => m.id)).toEqual([
      "rating-hose", "rating-valve", "rating-pump", "rating-cylinder", "plate-crosshead", "plate-bolster", "columns", "rod-buckling",
    ]);
    expect(r.overall).toBe("incomplete");
  });
});

describe("evaluateSizing: every block", () => {
  const r = evaluateSizing(FULL);

  it("fills every optional result", () => {
    expect(r.lineVelocities && Object.keys(r.lineVelocities)).toEqual(["suction", "pressure", "return"]);
    expect(r.buckling?.loadPerRodKn).toBeCloseTo(r.reliefForceKn / 2, 12);
    expect(r.plate?.role).toBe("crosshead");
    expect(r.plates?.map((p) => p.role)).toEqual(["crosshead", "bolster"]);
    expect(r.platen?.safetyFactor).toBeGreaterThan(2);
    expect(r.throat?.safetyFactor).toBeGreaterThan(2);
    expect(r.dies?.[0]?.exceededAtRelief).toBe(true);
    expect(r.missing).toEqual([]);
    expect(r.assumptions).toEqual([]);
    expect(r.columns?.loadPerColumnKn).toBeCloseTo(r.reliefForceKn / 4, 12);
    expect(r.reservoir?.recommendedOilL).toBe(120);
    expect(r.reservoir?.drawdownL).toBeCloseTo((2 * circleAreaMm2(56) * 250) / 1e6, 12);
    expect(r.maxPressureForMotorBar).toBeCloseTo((5.5 * 600 * 0.85) / 8, 9);
    expect(r.maxUnloadForMotorBar).toBeCloseTo((5.5 * 600 * 0.85) / 40, 9);
  });

  it("cycle: advance over stroke − press distance, press over it, retract over the stroke", () => {
    const expected = 210 / r.advanceSpeedMmS + 40 / r.pressingSpeedMmS + 250 / r.retractSpeedMmS; // computed from formula (b)
    expectRel(r.cycleTimeS ?? 0, expected, 1e-12);
  });

  it("gives every check an id, a level, a message, a rule and a source; ids are unique", () => {
    for (const c of r.checks) {
      expect(c.id).toMatch(/^[a-z0-9-]+$/);
      expect(["ok", "warn", "fail"]).toContain(c.level);
      for (const text of [c.message, c.rule, c.source]) expect(text.length).toBeGreaterThan(10);
    }
    expect(new Set(r.checks.map((c) => c.id)).size).toBe(r.checks.length);
  });

  it("overall is the worst check once nothing is missing", () => {
    expect(r.overall).toBe(r.checks.some((c) => c.level === "fail") ? "fail" : r.checks.some((c) => c.level === "warn") ? "warn" : "ok");
  });

  it("writes messages in the user's units", () => {
    const imperial = evaluateSizing(FULL, { system: "imperial" });
    const relief = imperial.checks.find((c) => c.id === "relief-vs-working");
    expect(relief?.message).toContain("psi");
    expect(relief?.message).not.toContain("bar");
    expect(imperial.forceKn).toBe(r.forceKn); // results stay SI-based
  });
});

describe("evaluateSizing: checks that must fail", () => {
  it("relief below working pressure", () => {
    expect(levelOf({ ...BASE, reliefBar: 180 }, "relief-vs-working")).toBe("fail");
  });

  it("a motor too small for the governing stage", () => {
    expect(levelOf({ ...BASE, motorKw: 4 }, "motor-power")).toBe("fail"); // needs 4.71 kW
    expect(levelOf({ ...BASE, motorKw: 5 }, "motor-power")).toBe("ok");
  });

  it("any component rated below relief makes the whole design fail", () => {
    const r = evaluateSizing({ ...FULL, ratings: { ...FULL.ratings, hoseBar: 207 } });
    expect(r.checks.find((c) => c.id === "rating-hose")?.level).toBe("fail");
    expect(r.overall).toBe("fail");
  });

  it("a plate or columns under a factor of 2 on yield make the design fail", () => {
    const thinPlate = evaluateSizing({
      ...FULL,
      plates: [FULL.plates![0]!, { role: "bolster", spanMm: 350, widthMm: 200, thicknessMm: 25, grade: "S235JR" }],
    });
    expect(thinPlate.checks.find((c) => c.id === "plate-bolster")?.level).toBe("fail");
    expect(thinPlate.overall).toBe("fail");
    const thinColumns = evaluateSizing({ ...FULL, columns: { count: 2, diameterMm: 20, grade: "S235JR" } });
    expect(thinColumns.overall).toBe("fail");
  });

  it("an unloading setting at or above relief warns", () => {
    expect(levelOf({ ...FULL, pump: { kind: "two-stage", approachFlowLpm: 40, pressingFlowLpm: 8, unloadBar: 210 } }, "unload-vs-relief")).toBe("warn");
  });

  it("an efficiency outside 80–95 % warns", () => {
    // Source: [ETB] overall efficiency 80–95 % (a)
    expect(levelOf({ ...BASE, overallEfficiency: 0.7 }, "efficiency-range")).toBe("warn");
    expect(levelOf({ ...BASE, overallEfficiency: 0.9 }, "efficiency-range")).toBe("ok");
  });
});

describe("evaluateSizing: refused input", () => {
  const problemsOf = (input: SizingInput): string[] => findInputProblems(input).map((p) => p.path);

  it("names each bad field", () => {
    expect(problemsOf({ ...BASE, cylinders: { count: 9, boreMm: 100, rodMm: 100, strokeMm: Number.NaN } })).toEqual([
      "cylinders.count",
      "cylinders.rodMm",
      "cylinders.strokeMm",
    ]);
    expect(problemsOf({ ...BASE, cylinders: { ...BASE.cylinders, boreMm: 0 } })).toContain("cylinders.boreMm");
    expect(problemsOf({ ...BASE, pressureBar: -5 })).toEqual(["pressureBar"]);
    expect(problemsOf({ ...BASE, pressDistanceMm: 301 })).toEqual(["pressDistanceMm"]);
    expect(problemsOf({ ...BASE, cylinders: { ...BASE.cylinders, count: 1.5 } })).toEqual(["cylinders.count"]);
  });

  it("refuses a pressing flow above the total, and unknown grades or fixities", () => {
    const pump = { kind: "two-stage", approachFlowLpm: 10, pressingFlowLpm: 12, unloadBar: 50 } as const;
    expect(problemsOf({ ...BASE, pump })).toEqual(["pump.pressingFlowLpm"]);
    const plate = { ...FULL.plates![0], grade: "S275" } as unknown as SizingInput["plate"];
    expect(problemsOf({ ...FULL, plate, plates: undefined })).toEqual(["plate.grade"]);
    expect(problemsOf({ ...FULL, plate: FULL.plates![0] })).toEqual(["plates.0.role"]);
    const buckling = { endFixity: "hinged", exposedRodMm: 10 } as unknown as SizingInput["buckling"];
    expect(problemsOf({ ...FULL, buckling })).toEqual(["buckling.endFixity"]);
  });

  it("throws SizingInputError carrying the problems", () => {
    try {
      evaluateSizing({ ...BASE, pressureBar: Number.POSITIVE_INFINITY });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(SizingInputError);
      expect((error as SizingInputError).problems).toEqual([{ path: "pressureBar", message: "must be a finite number" }]);
    }
  });
});
