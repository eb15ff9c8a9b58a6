/**
 * The moving platen between parallel rams. The rods push it down at their positions (F/n each,
 * symmetric about the die) and the work pushes back over the die width (F/w per mm): a free beam in
 * equilibrium. The moment at a distance x from the centre, from the part beyond x:
 *   M(x) = (F/n)·Σ(xᵢ − x) over rods beyond x  −  (F/w)·(w/2 − x)²/2 while x is under the die.
 * M is quadratic between the rod positions and the die edge, so its largest value is at one of
 * those points or where the shear is zero, and ∫M·(x_B − x) (the deflection of the outer rod
 * against the centre, by the moment-area theorem) is exact by Simpson's rule on each piece.
 * Two rods at spacing s over a die narrower than s give M = F·(2s − w)/8 at the centre (a simply
 * supported span s with the load spread over w). Factor on yield ≥ 2 at relief force, as the frame.
 */
import type { Fmt } from "./checks";
import { plateSection, strengthCheck } from "./frame";
import { STEEL_E_N_MM2, yieldStrength } from "./steel";
import type { Check, PlatenInput, PlatenResult } from "./types";

const N_PER_KN = 1000;
const NMM_PER_KNM = 1e6;

export interface PlatenBeam {
  /** Largest |M| (N·mm). */
  maxMomentNmm: number;
  /** ∫₀ᴮ M(x)·(B − x) dx (N·mm³), B the outer rod (or the die edge for one rod). */
  momentAreaNmm3: number;
}

/** Bending of the platen for a total force (N), `count` rods at `spacingMm`, die `dieWidthMm` wide. */
export function platenBeam(forceN: number, count: number, spacingMm: number, dieWidthMm: number): PlatenBeam {
  const perRod = forceN / count;
  const q = forceN / dieWidthMm;
  const halfDie = dieWidthMm / 2;
  const rods: number[] = [];
  for (let i = 0; i < count; i++) {
    const x = (i - (count - 1) / 2) * spacingMm;
    if (x > 0) rods.push(x);
  }
  const moment = (x: number): number => {
    let m = 0;
    for (const xi of rods) if (xi > x) m += perRod * (xi - x);
    if (x < halfDie) m -= (q * (halfDie - x) ** 2) / 2;
    return m;
  };
  const outer = rods.length > 0 ? Math.max(...rods) : halfDie;
  const points = [0, halfDie, ...rods];
  // Zero shear: perRod·k = q·(w/2 − x) for k rods beyond x.
  for (let k = 0; k <= rods.length; k++) {
    const x = halfDie - (perRod * k) / q;
    if (x > 0) points.push(x);
  }
  let maxMomentNmm = 0;
  for (const x of points) maxMomentNmm = Math.max(maxMomentNmm, Math.abs(moment(x)));

  const breaks = [...new Set([0, outer, ...rods, halfDie].filter((x) => x <= outer))].sort((a, b) => a - b);
  let momentAreaNmm3 = 0;
  const integrand = (x: number): number => moment(x) * (outer - x);
  for (let i = 1; i < breaks.length; i++) {
    const a = breaks[i - 1] ?? 0;
    const b = breaks[i] ?? 0;
    momentAreaNmm3 += ((b - a) / 6) * (integrand(a) + 4 * integrand((a + b) / 2) + integrand(b));
  }
  return { maxMomentNmm, momentAreaNmm3 };
}

export function evaluatePlaten(platen: PlatenInput, cylinderCount: number, forceKn: number): PlatenResult {
  const section = plateSection(platen);
  const beam = platenBeam(forceKn * N_PER_KN, cylinderCount, platen.rodSpacingMm, platen.dieWidthMm);
  const stressMpa = beam.maxMomentNmm / section.sectionModulusMm3;
  const { yieldMpa, covered } = yieldStrength(platen.grade, platen.thicknessMm);
  return {
    momentKnM: beam.maxMomentNmm / NMM_PER_KNM,
    stressMpa,
    deflectionMm: Math.abs(beam.momentAreaNmm3) / (STEEL_E_N_MM2 * section.inertiaMm4),
    yieldMpa,
    safetyFactor: yieldMpa / stressMpa,
    yieldTableCovers: covered,
  };
}

export function platenCheck(platen: PlatenInput, cylinderCount: number, result: PlatenResult, fmt: Fmt): Check {
  const what = `Platen between ${cylinderCount} rod${cylinderCount > 1 ? "s" : ""} ${fmt("length", platen.rodSpacingMm)} apart over a ${fmt("length", platen.dieWidthMm)} die, bending`;
  const check = strengthCheck("platen", what, result, platen.grade, fmt);
  check.message += ` The die centre bends about ${fmt("length", result.deflectionMm)} against the rods (estimate); an off-centre workpiece loads one rod more and tilts the platen.`;
  check.rule = `${check.rule} Beam loaded by the rods and reacted by the work over the die width.`;
  return check;
}
