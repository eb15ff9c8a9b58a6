/**
 * Inverse sizing: what bore gives a target force at a pressure, and what flow gives a target
 * speed. Standard bores let the builder pick a cylinder that exists.
 */
import { MM_PER_IN } from "@/lib/units";
import { areaForForceMm2, circleAreaMm2, forceKn, pressureForForceBar } from "./force";
import { flowLpmForSpeed } from "./speed";

/** ISO 3320 cylinder bore series (mm) — from memory. */
export const ISO_3320_BORES_MM: readonly number[] = [
  8, 10, 12, 16, 20, 25, 32, 40, 50, 63, 80, 100, 125, 160, 200, 250, 320, 400, 500,
];

/** Common inch bores of tie-rod and welded cylinders (in) — common practice, from memory. */
export const INCH_BORES_IN: readonly number[] = [1.5, 2, 2.5, 3, 3.25, 3.5, 4, 4.5, 5, 6, 7, 8, 10, 12];

/** Bore (mm) of each of `count` equal cylinders giving `targetKn` at `pressureBar`. */
export function requiredBoreMm(targetKn: number, pressureBar: number, count = 1): number {
  const areaEachMm2 = areaForForceMm2(targetKn, pressureBar) / count;
  return Math.sqrt((4 * areaEachMm2) / Math.PI);
}

/** Flow (L/min) that moves `count` cylinders of a bore at a speed. */
export function requiredFlowLpm(speedMmS: number, boreMm: number, count = 1): number {
  return flowLpmForSpeed(speedMmS, count * circleAreaMm2(boreMm));
}

export interface BoreOption {
  series: "ISO 3320" | "inch";
  /** e.g. "63 mm" or "3.25 in" */
  label: string;
  boreMm: number;
  /** Force of all cylinders at the target pressure. */
  forceKn: number;
  /** Pressure this bore needs for the target force. */
  pressureForTargetBar: number;
}

export interface BoreChoice {
  /** Largest standard bore below the requirement: falls short of the force at this pressure. */
  below?: BoreOption;
  /** Smallest standard bore at or above the requirement. */
  atOrAbove?: BoreOption;
}

export interface BoreSuggestion {
  requiredBoreMm: number;
  metric: BoreChoice;
  inch: BoreChoice;
}

export interface ForceTarget {
  forceKn: number;
  pressureBar: number;
  count: number;
}

export function suggestBores(target: ForceTarget): BoreSuggestion {
  const need = requiredBoreMm(target.forceKn, target.pressureBar, target.count);
  const metric = ISO_3320_BORES_MM.map((mm) => ({ boreMm: mm, label: `${mm} mm` }));
  const inch = INCH_BORES_IN.map((inches) => ({ boreMm: inches * MM_PER_IN, label: `${inches} in` }));
  return {
    requiredBoreMm: need,
    metric: choose(metric, need, target, "ISO 3320"),
    inch: choose(inch, need, target, "inch"),
  };
}

// Guards against a computed requirement of 63.0000000001 mm skipping the 63 mm bore.
const MATCH_TOLERANCE = 1e-9;

function choose(
  series: ReadonlyArray<{ boreMm: number; label: string }>,
  needMm: number,
  target: ForceTarget,
  name: BoreOption["series"],
): BoreChoice {
  const toOption = (s: { boreMm: number; label: string }): BoreOption => {
    const areaMm2 = target.count * circleAreaMm2(s.boreMm);
    return {
      series: name,
      label: s.label,
      boreMm: s.boreMm,
      forceKn: forceKn(target.pressureBar, areaMm2),
      pressureForTargetBar: pressureForForceBar(target.forceKn, areaMm2),
    };
  };
  const index = series.findIndex((s) => s.boreMm >= needMm * (1 - MATCH_TOLERANCE));
  const above = index === -1 ? undefined : series[index];
  const below = index === -1 ? series[series.length - 1] : series[index - 1];
  return {
    ...(below ? { below: toOption(below) } : {}),
    ...(above ? { atOrAbove: toOption(above) } : {}),
  };
}
