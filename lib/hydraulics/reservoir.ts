/**
 * Reservoir rule of thumb: about 3 minutes of pump flow in oil [FIR] (3–5 by other sources [HL]),
 * and the tank filled to about 80 % [MC]: 40 L/min → 120 L of oil → 150 L tank.
 */
import { makeCheck, type Fmt } from "./checks";
import { cite } from "./sources";
import type { Check, ReservoirResult } from "./types";

export const RESERVOIR_MINUTES = 3;
export const RESERVOIR_FILL_FRACTION = 0.8;

export function recommendedOilL(pumpFlowLpm: number): number {
  return RESERVOIR_MINUTES * pumpFlowLpm;
}

export function recommendedTankL(pumpFlowLpm: number): number {
  return recommendedOilL(pumpFlowLpm) / RESERVOIR_FILL_FRACTION;
}

/** The largest pump flow (the approach flow of a two-stage pump) sets the size. */
export function evaluateReservoir(volumeL: number, pumpFlowLpm: number): ReservoirResult {
  return { volumeL, recommendedOilL: recommendedOilL(pumpFlowLpm), recommendedTankL: recommendedTankL(pumpFlowLpm) };
}

export function reservoirCheck(r: ReservoirResult, fmt: Fmt): Check {
  const small = r.volumeL < r.recommendedOilL;
  const head = `Tank ${fmt("volume", r.volumeL)} against ${fmt("volume", r.recommendedOilL)} of oil (3 minutes of pump flow)`;
  const message = small
    ? `${head}: small — the oil will run hot and have little time to shed air and dirt. About ${fmt("volume", r.recommendedTankL)} of tank at 80 % fill is usual.`
    : `${head}: enough.`;
  return makeCheck(
    "reservoir-volume",
    small ? "warn" : "ok",
    message,
    "Reservoir holds about 3 × the pump flow per minute; the tank is filled to about 80 %.",
    cite("FIR", "MC"),
  );
}
