/**
 * Reservoir rules. Size: about 3 minutes of pump flow in oil [FIR] (3–5 by other sources [HL]),
 * the tank filled to about 80 % [MC]: 40 L/min → 120 L of oil → 150 L tank; the tank is compared
 * with the rule's tank size, like with like. Drawdown: extending the rods takes oil out of the tank
 * (the cap side fills while the smaller annulus empties) — over a full stroke the rod volume times
 * the cylinder count — and it must stay above the suction pickup (computed from the areas).
 */
import { makeCheck, type Fmt } from "./checks";
import { COMMON_PRACTICE, FROM_FORMULA, cite } from "./sources";
import { sweptVolumeL } from "./speed";
import type { Check, ReservoirInput, ReservoirResult } from "./types";

export const RESERVOIR_MINUTES = 3;
export const RESERVOIR_FILL_FRACTION = 0.8;
/** Usable share of the tank above the pickup when not given: our cautious assumption (common practice). */
export const ASSUMED_USABLE_FRACTION = 0.5;

export function recommendedOilL(pumpFlowLpm: number): number {
  return RESERVOIR_MINUTES * pumpFlowLpm;
}

export function recommendedTankL(pumpFlowLpm: number): number {
  return recommendedOilL(pumpFlowLpm) / RESERVOIR_FILL_FRACTION;
}

/** Oil drawn from the tank over a full stroke: (cap − annulus) area × stroke, all cylinders. */
export function drawdownL(capMm2: number, annulusMm2: number, strokeMm: number): number {
  return sweptVolumeL(capMm2 - annulusMm2, strokeMm);
}

/** The largest pump flow (the approach flow of a two-stage pump) sets the size. */
export function evaluateReservoir(block: ReservoirInput, pumpFlowLpm: number, drawL: number): ReservoirResult {
  const usableAssumed = block.usableL === undefined;
  return {
    volumeL: block.volumeL,
    recommendedOilL: recommendedOilL(pumpFlowLpm),
    recommendedTankL: recommendedTankL(pumpFlowLpm),
    drawdownL: drawL,
    usableL: block.usableL ?? block.volumeL * ASSUMED_USABLE_FRACTION,
    usableAssumed,
  };
}

export function reservoirChecks(r: ReservoirResult, fmt: Fmt): Check[] {
  const small = r.volumeL < r.recommendedTankL;
  const head = `Tank ${fmt("volume", r.volumeL)} against the ${fmt("volume", r.recommendedTankL)} tank the rule gives (${fmt("volume", r.recommendedOilL)} of oil, 3 minutes of pump flow, at 80 % fill)`;
  const size = makeCheck(
    "reservoir-volume",
    small ? "warn" : "ok",
    small ? `${head}: small — the oil will run hot and have little time to shed air and dirt.` : `${head}: enough.`,
    "Reservoir holds about 3 × the pump flow per minute; the tank is filled to about 80 %.",
    cite("FIR", "MC"),
  );
  const short = r.drawdownL > r.usableL;
  const usable = `${fmt("volume", r.usableL)} usable above the pickup${r.usableAssumed ? " (assumed: half the tank; enter your own)" : ""}`;
  const drawHead = `Extending the rods draws ${fmt("volume", r.drawdownL)} out of the tank against ${usable}`;
  const draw = makeCheck(
    "reservoir-drawdown",
    short ? "fail" : "ok",
    short ? `${drawHead}: the pump would suck air at full stroke. Use a larger tank or lower pickup.` : `${drawHead}.`,
    "Oil drawn by the rods over a full stroke (cap volume − annulus volume, × cylinders) ≤ the volume above the suction pickup.",
    `${FROM_FORMULA}; assumed usable share ${COMMON_PRACTICE}`,
  );
  return [size, draw];
}
