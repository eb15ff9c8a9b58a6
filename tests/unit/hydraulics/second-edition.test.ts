/**
 * Sizing, second edition: platen between rams, open-throat frames, die limits, two-stage pumps
 * whose large section never unloads, and the "incomplete" verdict.
 */
import { describe, expect, it } from "vitest";
import { evaluateSizing, platenBeam, throatSection, type SizingInput } from "@/lib/hydraulics";
import { circleAreaMm2 } from "@/lib/hydraulics/force";
import { expectRel } from "./helpers";
import { FULL_SIZING_INPUT } from "../../fixtures/sizing-inputs";

const E = 210_000;

describe("platen between rams", () => {
  it("two rods over a narrower die: M = F·(2s − w)/8 at the centre", () => {
    // Hand calculation: F = 400 kN, s = 400 mm, w = 100 mm → M = 400,000 × 700 / 8 = 35,000,000 N·mm
    const beam = platenBeam(400_000, 2, 400, 100);
    expectRel(beam.maxMomentNmm, 35e6, 1e-12);
  });

  it("limits: a point-load die gives F·s/4 [PD]; a die as wide as the rod span gives F·s/8 (uniform load)", () => {
    // Source: [PD] piping-designer.com simple beam centre load, M = PL/4 (a); uniform load qL²/8 (b)
    expectRel(platenBeam(100_000, 2, 300, 1e-6).maxMomentNmm, (100_000 * 300) / 4, 1e-6);
    expectRel(platenBeam(100_000, 2, 300, 300).maxMomentNmm, (100_000 * 300) / 8, 1e-12);
  });

  it("deflection of the die centre against the rods: P(8L³ − 4Lb² + b³)/(384EI)", () => {
    // Simply supported span L with the load P spread over a central length b (computed from formula (b));
    // b = L gives 5PL³/384EI, b → 0 gives PL³/48EI [PD].
    const check = (P: number, L: number, b: number): void => {
      const beam = platenBeam(P, 2, L, b);
      expectRel(beam.momentAreaNmm3 / E, (P * (8 * L ** 3 - 4 * L * b * b + b ** 3)) / 384 / E, 1e-9);
    };
    check(300_000, 400, 120);
    check(300_000, 400, 400);
  });

  it("three rods: the largest moment is found where the shear is zero, not only at the centre", () => {
    // Hand calculation: F = 300 kN, rods at −250, 0, +250 (100 kN each), die 100 wide (q = 3,000 N/mm).
    // M(0) = 100,000·250 − 3,000·50²/2 = 21.25e6 N·mm; zero shear at x = 50 − 100,000/3,000 = 16.667 mm:
    // M = 100,000·233.333 − 3,000·33.333²/2 = 23.333e6 − 1.667e6 = 21.667e6 N·mm, the largest.
    const beam = platenBeam(300_000, 3, 250, 100);
    expectRel(beam.maxMomentNmm, 21.6667e6, 1e-5);
  });

  it("a thin platen on a two-ram press fails and names the platen", () => {
    const input: SizingInput = {
      ...FULL_SIZING_INPUT,
      platen: { rodSpacingMm: 400, dieWidthMm: 80, widthMm: 200, thicknessMm: 20, grade: "S235JR" },
    };
    const r = evaluateSizing(input);
    const check = r.checks.find((c) => c.id === "platen");
    expect(check?.level).toBe("fail");
    expect(check?.message).toContain("Platen");
    expect(r.overall).toBe("fail");
    // Hand calculation: F = 2 × π·100²/4 × 210 / 10 = 329.9 kN; M = F(2·400 − 80)/8 = 29.69 kN·m;
    // S = 200·20²/6 = 13,333 mm³ → σ = 2,227 MPa
    expectRel(r.platen?.momentKnM ?? 0, (((2 * circleAreaMm2(100) * 210) / 10) * (800 - 80)) / 8 / 1e6, 1e-12);
  });
});

describe("open-throat frame", () => {
  it("solid section: A = h·t, S = t·h²/6, I = t·h³/12", () => {
    expect(throatSection({ depthMm: 1, heightMm: 1, thicknessMm: 40, grade: "S355JR", sectionDepthMm: 300 })).toEqual({
      areaMm2: 12_000,
      sectionModulusMm3: 600_000,
      inertiaMm4: 90_000_000,
    });
  });

  it("combined tension and bending, and the jaws' opening angle", () => {
    // Hand calculation: F = 200 kN (1 × 100 mm bore... chosen by relief), e = 250 mm, h = 300 mm, t = 40 mm
    // σ = F/A + F·e/S = 200,000/12,000 + 200,000·250/600,000 = 16.67 + 83.33 = 100 MPa; S355 at 40 mm: 345 → 3.45
    // θ = F·e·H/(E·I) = 200,000·250·600/(210,000·9e7) = 1.587e-3 rad = 0.0909°; gap = θ·e = 0.397 mm
    const reliefBar = (200 * 10_000) / circleAreaMm2(100); // gives exactly 200 kN
    const r = evaluateSizing({
      cylinders: { count: 1, boreMm: 100, rodMm: 50, strokeMm: 200 },
      pump: { kind: "single", flowLpm: 10 },
      pressureBar: reliefBar,
      reliefBar,
      throat: { depthMm: 250, heightMm: 600, sectionDepthMm: 300, thicknessMm: 40, grade: "S355JR" },
    });
    expectRel(r.throat?.stressMpa ?? 0, 100, 1e-9);
    expectRel(r.throat?.safetyFactor ?? 0, 3.45, 1e-9);
    expectRel(r.throat?.openingDeg ?? 0, ((200_000 * 250 * 600) / (E * 9e7)) * (180 / Math.PI), 1e-9);
    expectRel(r.throat?.gapOpeningMm ?? 0, 0.3968, 1e-3);
    const check = r.checks.find((c) => c.id === "throat");
    expect(check?.level).toBe("ok");
    expect(check?.message).toContain("tilts the dies");
    // A throat replaces crosshead and columns on the missing list
    expect(r.missing.map((m) => m.id)).not.toContain("columns");
  });
});

describe("die limits", () => {
  it("the highest gauge reading within a die's limit is F_max / A_cap, and a limit below the relief force warns", () => {
    // Hand calculation: 2 × 100 mm bores = 15,708 mm²; 250 kN → 250 × 10,000 / 15,708 = 159.2 bar
    const r = evaluateSizing(FULL_SIZING_INPUT);
    expectRel(r.dies?.[0]?.maxGaugeBar ?? 0, (250 * 10_000) / (2 * circleAreaMm2(100)), 1e-12);
    const check = r.checks.find((c) => c.id === "die-limit-1");
    expect(check?.level).toBe("warn");
    expect(check?.message).toContain("never go above 159 bar");
    const strong = evaluateSizing({ ...FULL_SIZING_INPUT, dies: [{ name: "Swage", maxForceKn: 500 }] });
    expect(strong.checks.find((c) => c.id === "die-limit-1")?.level).toBe("ok");
  });
});

describe("two-stage pump that never unloads, end to end", () => {
  it("pressing speed, pressing power and the motor follow the total flow", () => {
    // Hand calculation: 40 L/min total on a 125 mm bore: 40e6/60/12,272 = 54.3 mm/s; 40 × 210 / 600 = 14 kW
    const r = evaluateSizing({
      cylinders: { count: 1, boreMm: 125, rodMm: 70, strokeMm: 250 },
      pump: { kind: "two-stage", approachFlowLpm: 40, pressingFlowLpm: 9, unloadBar: 250 },
      pressureBar: 200,
      reliefBar: 210,
      motorKw: 20,
    });
    expect(r.pressingSpeedMmS).toBe(r.advanceSpeedMmS);
    expectRel(r.pressingPowerKw, 14, 1e-12);
    expectRel(r.motorRequiredKw, 14 / 0.85, 1e-12);
    // 20 kW · 600 · 0.85 / 40 = 255 bar, not the 1133 bar the small section alone would suggest
    expectRel(r.maxPressureForMotorBar ?? 0, 255, 1e-12);
    expect(r.checks.find((c) => c.id === "unload-vs-relief")?.level).toBe("warn");
  });
});

describe("incomplete is not ok", () => {
  it("a design passing every check it ran but missing the platen of a two-ram press is incomplete", () => {
    const { platen: _platen, ...withoutPlaten } = FULL_SIZING_INPUT;
    const r = evaluateSizing({ ...withoutPlaten, dies: [] });
    expect(r.missing.map((m) => m.id)).toEqual(["platen"]);
    expect(r.overall).toBe("incomplete");
  });

  it("a fail still wins over incomplete", () => {
    const r = evaluateSizing({
      cylinders: { count: 1, boreMm: 100, rodMm: 50, strokeMm: 300 },
      pump: { kind: "single", flowLpm: 12 },
      pressureBar: 200,
      reliefBar: 150,
    });
    expect(r.overall).toBe("fail");
    expect(r.missing.length).toBeGreaterThan(0);
  });
});

describe("every number in a check message follows the user's unit system", () => {
  it("imperial messages carry no metric unit, metric ones no imperial unit", () => {
    const words = (system: "metric" | "imperial") =>
      evaluateSizing({ ...FULL_SIZING_INPUT, reservoir: { volumeL: 150, usableL: 60 } }, { system }).checks.map((c) => c.message).join(" ");
    const imperial = words("imperial");
    expect(imperial).toMatch(/\d psi\b/);
    expect(imperial).toMatch(/\d in\b/);
    for (const metric of [/\d bar\b/, /\d mm\b/, /\d MPa\b/, /\d kN\b/, /\d L\b/, /\d kW\b/, /L\/min/, /m\/s\b/]) {
      expect(imperial, String(metric)).not.toMatch(metric);
    }
    const metric = words("metric");
    for (const imp of [/\d psi\b/, /\d in\b/, /\d ksi\b/, /US gal/, /\d hp\b/, /US tonf/, /ft\/s/]) {
      expect(metric, String(imp)).not.toMatch(imp);
    }
  });
});
