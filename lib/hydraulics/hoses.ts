/**
 * Component pressure ratings against the relief setting, and hose rating helpers.
 * The relief valve is what limits pressure, so every part it protects must be rated at or above
 * it; a part rated below relief is a fail whatever else the design gets right.
 */
import { convert } from "@/lib/units";
import { makeCheck, type Fmt } from "./checks";
import { COMMON_PRACTICE, cite } from "./sources";
import type { Check, RatingsInput } from "./types";

/** SAE J517: minimum burst pressure is 4 × the maximum working pressure [HAT]. */
export const HOSE_BURST_FACTOR = 4;

export function minimumBurstBar(workingBar: number): number {
  return HOSE_BURST_FACTOR * workingBar;
}

/** An assembly is rated at the lower of its hose and its fittings [J517]. */
export function assemblyRatingBar(hoseBar: number, fittingBar: number): number {
  return Math.min(hoseBar, fittingBar);
}

export type HoseType = "100R1AT" | "100R2AT" | "EN 853 2SN" | "100R12" | "100R13";
export type DashSize = 4 | 6 | 8 | 12 | 16;

const DASH_SIZES: readonly DashSize[] = [4, 6, 8, 12, 16];

/**
 * Typical maximum working pressures by dash size (inside diameter in 1/16 in), from memory
 * (hydraulics-reference.md §6 (c); the end points agree with the Parker blog). The rating printed
 * on the hose layline always wins. 100R12 and 100R13 are listed with one value for every size,
 * though not every maker builds every size.
 */
const TYPICAL_WORKING: Readonly<Record<HoseType, { unit: "psi" | "bar"; values: readonly number[] }>> = {
  "100R1AT": { unit: "psi", values: [3250, 2600, 2325, 1525, 1275] },
  "100R2AT": { unit: "psi", values: [5800, 4800, 4000, 3100, 2400] },
  "EN 853 2SN": { unit: "bar", values: [400, 330, 275, 215, 165] },
  "100R12": { unit: "psi", values: [4000, 4000, 4000, 4000, 4000] },
  "100R13": { unit: "psi", values: [5000, 5000, 5000, 5000, 5000] },
};

/** Typical working pressure (bar) of a hose type and dash size; a starting value for forms only. */
export function typicalHoseWorkingBar(type: HoseType, dash: DashSize): number {
  const { unit, values } = TYPICAL_WORKING[type];
  const value = values[DASH_SIZES.indexOf(dash)];
  if (value === undefined) throw new RangeError(`No typical rating for ${type} -${dash}`);
  return unit === "bar" ? value : convert("pressure", value, "psi", "bar");
}

const COMPONENTS: ReadonlyArray<{ key: keyof RatingsInput; rated: string }> = [
  { key: "hoseBar", rated: "Hose assembly rated" },
  { key: "valveBar", rated: "Valve rated" },
  { key: "pumpBar", rated: "Pump rated" },
  { key: "cylinderBar", rated: "Cylinder rated" },
  { key: "gaugeBar", rated: "Gauge reads up to" },
];

const RULE =
  "Every component's rated pressure must be at or above the relief setting, with margin for pressure surges.";
const SOURCE = `relief below the lowest rating ${COMMON_PRACTICE}; rating ≥ system pressure including surges: SAE J1273 via ${cite("KURT", "JAS")}`;

export function ratingChecks(ratings: RatingsInput, reliefBar: number, fmt: Fmt): Check[] {
  const checks: Check[] = [];
  for (const { key, rated } of COMPONENTS) {
    const ratingBar = ratings[key];
    if (ratingBar !== undefined) checks.push(ratingCheck(key, rated, ratingBar, reliefBar, fmt));
  }
  return checks;
}

function ratingCheck(key: keyof RatingsInput, rated: string, ratingBar: number, reliefBar: number, fmt: Fmt): Check {
  const id = `rating-${key.replace(/Bar$/, "")}`;
  const head = `${rated} ${fmt("pressure", ratingBar)}, relief set at ${fmt("pressure", reliefBar)}`;
  if (ratingBar < reliefBar) {
    const effect = key === "gaugeBar" ? "the gauge will go off scale and may burst" : "it can burst before the relief opens";
    return makeCheck(id, "fail", `${head}: rated below relief — ${effect}. Lower the relief or fit a higher-rated part.`, RULE, SOURCE);
  }
  if (ratingBar === reliefBar) {
    return makeCheck(id, "warn", `${head}: no margin left for pressure surges.`, RULE, SOURCE);
  }
  return makeCheck(id, "ok", `${head}: rated above relief.`, RULE, SOURCE);
}
