/**
 * Component pressure ratings against the relief setting, and hose rating helpers.
 * The relief valve is what limits pressure, so every part it protects must be rated at or above
 * it; a part rated below relief is a fail whatever else the design gets right.
 */
import { convert, formatNumber } from "@/lib/units";
import { makeCheck, type Fmt } from "./checks";
import { COMMON_PRACTICE, FROM_FORMULA, cite } from "./sources";
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

/** Parts the relief valve protects: rated below relief is a fail, within its override a warning. */
const COMPONENTS: ReadonlyArray<{ key: "hoseBar" | "valveBar" | "pumpBar" | "cylinderBar"; rated: string }> = [
  { key: "hoseBar", rated: "Hose assembly rated" },
  { key: "valveBar", rated: "Valve rated" },
  { key: "pumpBar", rated: "Pump rated" },
  { key: "cylinderBar", rated: "Cylinder rated" },
];

/**
 * A direct-acting relief valve passes its full flow only some way above its cracking setting
 * (pressure override), so the circuit sees more than the setting while it relieves. We allow 10 %
 * above the setting: common practice, the figure from memory (overrides of 10–20 % are usual for
 * direct-acting valves; a pilot-operated valve holds closer). A part rated inside it is a warning.
 */
export const RELIEF_OVERRIDE_FRACTION = 0.1;
/** The relief reading should sit no higher than 75 % of the gauge's full scale [CSG]. */
export const GAUGE_MAX_READING_FRACTION = 0.75;

const RULE = `Every component's rated pressure must be above the relief setting plus the relief valve's pressure override (${RELIEF_OVERRIDE_FRACTION * 100} % allowed), with margin for surges.`;
const SOURCE = `relief below the lowest rating and the ${RELIEF_OVERRIDE_FRACTION * 100} % override ${COMMON_PRACTICE}; rating ≥ system pressure including surges: SAE J1273 via ${cite("KURT", "JAS")}`;

export function ratingChecks(ratings: RatingsInput, reliefBar: number, areaRatio: number, fmt: Fmt): Check[] {
  const checks: Check[] = [];
  for (const { key, rated } of COMPONENTS) {
    const ratingBar = ratings[key];
    if (ratingBar !== undefined) checks.push(ratingCheck(key, rated, ratingBar, reliefBar, fmt));
  }
  if (ratings.gaugeBar !== undefined) checks.push(gaugeCheck(ratings.gaugeBar, reliefBar, fmt));
  if (ratings.cylinderBar !== undefined) checks.push(intensificationCheck(ratings.cylinderBar, reliefBar, areaRatio, fmt));
  return checks;
}

function ratingCheck(key: string, rated: string, ratingBar: number, reliefBar: number, fmt: Fmt): Check {
  const id = `rating-${key.replace(/Bar$/, "")}`;
  const head = `${rated} ${fmt("pressure", ratingBar)}, relief set at ${fmt("pressure", reliefBar)}`;
  const overrideBar = reliefBar * (1 + RELIEF_OVERRIDE_FRACTION);
  if (ratingBar < reliefBar) {
    return makeCheck(id, "fail", `${head}: rated below relief — it can burst before the relief opens. Lower the relief or fit a higher-rated part.`, RULE, SOURCE);
  }
  if (ratingBar < overrideBar) {
    return makeCheck(
      id,
      "warn",
      `${head}: within the relief valve's override — while relieving the circuit can reach about ${fmt("pressure", overrideBar)}. Fit a part rated above that or set the relief lower.`,
      RULE,
      SOURCE,
    );
  }
  return makeCheck(id, "ok", `${head}: rated above the relief and its override.`, RULE, SOURCE);
}

function gaugeCheck(fullScaleBar: number, reliefBar: number, fmt: Fmt): Check {
  const head = `Gauge reads up to ${fmt("pressure", fullScaleBar)}, relief set at ${fmt("pressure", reliefBar)}`;
  const share = reliefBar / fullScaleBar;
  const pct = `${formatNumber(share * 100, 3)} % of full scale`;
  const rule = `The relief reading sits at no more than ${GAUGE_MAX_READING_FRACTION * 100} % of the gauge's full scale (the recommended 50–75 % band); accuracy is stated for the middle half of the scale.`;
  const source = cite("CSG", "B40");
  if (fullScaleBar < reliefBar) {
    return makeCheck("rating-gauge", "fail", `${head}: the gauge goes off scale before the relief opens and may burst. Fit a gauge of about ${fmt("pressure", reliefBar * 2)}.`, rule, source);
  }
  if (share > GAUGE_MAX_READING_FRACTION) {
    return makeCheck("rating-gauge", "warn", `${head}: the relief reads at ${pct}, above the recommended band. A gauge of at least ${fmt("pressure", reliefBar / GAUGE_MAX_READING_FRACTION)} full scale reads it well.`, rule, source);
  }
  return makeCheck("rating-gauge", "ok", `${head}: the relief reads at ${pct}.`, rule, source);
}

/**
 * If the rod-side port is blocked while the cylinder extends, the annulus pressure rises to
 * p·A_cap / A_annulus (computed from the force balance). Above the cylinder's rating that is a
 * warning: it takes a fault (a closed valve port, a pinched hose), but it can split the cylinder.
 */
export function intensifiedBar(reliefBar: number, areaRatio: number): number {
  return reliefBar * areaRatio;
}

function intensificationCheck(cylinderBar: number, reliefBar: number, areaRatio: number, fmt: Fmt): Check {
  const p = intensifiedBar(reliefBar, areaRatio);
  const over = p > cylinderBar;
  const head = `With the rod-side port blocked while extending, the rod side would reach ${fmt("pressure", p)} (relief × ${formatNumber(areaRatio, 3)}, cap area / annulus area) against the cylinder's ${fmt("pressure", cylinderBar)} rating`;
  return makeCheck(
    "rod-side-intensification",
    over ? "warn" : "ok",
    over ? `${head}: never let the rod-side line be closed while extending; a rod-side relief or a valve with its ports open to tank in neutral guards it.` : `${head}: within the rating.`,
    "Rod-side pressure with the rod port blocked = relief × cap area / annulus area, at or below the cylinder's rating.",
    FROM_FORMULA,
  );
}
