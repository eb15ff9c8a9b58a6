/**
 * Ram speeds, volumes and stroke times. v(mm/s) = Q(L/min) · 10⁶ / (60 · A mm²):
 * 1 L = 10⁶ mm³ and a minute has 60 s.
 */
import type { PumpInput } from "./types";

const MM3_PER_L = 1e6;
const S_PER_MIN = 60;

export function speedMmS(flowLpm: number, areaMm2: number): number {
  return (flowLpm * MM3_PER_L) / (S_PER_MIN * areaMm2);
}

/** The flow that moves an area at a speed: the inverse of speedMmS. */
export function flowLpmForSpeed(speedMmSValue: number, areaMm2: number): number {
  return (speedMmSValue * areaMm2 * S_PER_MIN) / MM3_PER_L;
}

/** Oil swept by an area over a length (L). */
export function sweptVolumeL(areaMm2: number, lengthMm: number): number {
  return (areaMm2 * lengthMm) / MM3_PER_L;
}

export interface PumpFlows {
  /** Flow while pressure is below the unloading setting (both sections of a two-stage pump). */
  approachLpm: number;
  /**
   * Flow while pressing at the working pressure: the small section alone once the large one has
   * unloaded; the total when the unloading setting is above the working pressure or at/above relief.
   */
  pressingLpm: number;
  /** Flow against the relief setting: the total when the large section never unloads. */
  reliefLpm: number;
  /** Two-stage only: false when the unloading setting is at or above relief, so it never unloads. */
  largeUnloads: boolean;
}

/**
 * Both sections feed the cylinder until the unloading setting; above it only the small one pumps
 * [HP, CD]. A setting at or above relief is never reached, so the full flow follows through.
 */
export function pumpFlows(pump: PumpInput, workingBar: number, reliefBar: number): PumpFlows {
  if (pump.kind === "single") {
    return { approachLpm: pump.flowLpm, pressingLpm: pump.flowLpm, reliefLpm: pump.flowLpm, largeUnloads: false };
  }
  const largeUnloads = pump.unloadBar < reliefBar;
  const unloadedWhilePressing = largeUnloads && pump.unloadBar <= workingBar;
  return {
    approachLpm: pump.approachFlowLpm,
    pressingLpm: unloadedWhilePressing ? pump.pressingFlowLpm : pump.approachFlowLpm,
    reliefLpm: largeUnloads ? pump.pressingFlowLpm : pump.approachFlowLpm,
    largeUnloads,
  };
}

export interface RamSpeeds {
  advanceMmS: number;
  pressingMmS: number;
  /** Approach flow on the annulus: retract pressure stays below the unloading setting. */
  retractMmS: number;
}

export function ramSpeeds(flows: PumpFlows, capMm2: number, annulusMm2: number): RamSpeeds {
  return {
    advanceMmS: speedMmS(flows.approachLpm, capMm2),
    pressingMmS: speedMmS(flows.pressingLpm, capMm2),
    retractMmS: speedMmS(flows.approachLpm, annulusMm2),
  };
}

export interface CycleSplit {
  advanceS: number;
  pressS: number;
  retractS: number;
}

/**
 * One cycle: advance at approach speed over (stroke − press distance), press over the press
 * distance, retract at retract speed over the full stroke. Valve shift and dwell times are ignored.
 */
export function cycleSplitS(strokeMm: number, pressDistanceMm: number, speeds: RamSpeeds): CycleSplit {
  return {
    advanceS: (strokeMm - pressDistanceMm) / speeds.advanceMmS,
    pressS: pressDistanceMm / speeds.pressingMmS,
    retractS: strokeMm / speeds.retractMmS,
  };
}

export function cycleTimeS(strokeMm: number, pressDistanceMm: number, speeds: RamSpeeds): number {
  const split = cycleSplitS(strokeMm, pressDistanceMm, speeds);
  return split.advanceS + split.pressS + split.retractS;
}
