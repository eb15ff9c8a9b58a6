/**
 * Cylinder areas and forces. F = p·A with p the gauge pressure (never add atmospheric);
 * retract acts on the annulus; parallel cylinders at one pressure add their areas.
 * 1 bar = 0.1 N/mm², so F(kN) = p(bar) · A(mm²) / 10,000.
 */
import { convert } from "@/lib/units";
import type { CylinderInput } from "./types";

const MM2_BAR_PER_KN = 10_000;

export function circleAreaMm2(diameterMm: number): number {
  return (Math.PI * diameterMm * diameterMm) / 4;
}

/** Area the rod side pushes on: bore circle minus rod circle. */
export function annulusAreaMm2(boreMm: number, rodMm: number): number {
  return circleAreaMm2(boreMm) - circleAreaMm2(rodMm);
}

export function forceKn(pressureBar: number, areaMm2: number): number {
  return (pressureBar * areaMm2) / MM2_BAR_PER_KN;
}

/** Area (mm²) that gives a force at a pressure. */
export function areaForForceMm2(forceKnValue: number, pressureBar: number): number {
  return (forceKnValue * MM2_BAR_PER_KN) / pressureBar;
}

export function pressureForForceBar(forceKn: number, areaMm2: number): number {
  return (forceKn * MM2_BAR_PER_KN) / areaMm2;
}

export interface CylinderAreas {
  capMm2: number;
  annulusMm2: number;
}

/** Total extend and retract areas of all cylinders. */
export function cylinderAreas(cylinders: Pick<CylinderInput, "count" | "boreMm" | "rodMm">): CylinderAreas {
  return {
    capMm2: cylinders.count * circleAreaMm2(cylinders.boreMm),
    annulusMm2: cylinders.count * annulusAreaMm2(cylinders.boreMm, cylinders.rodMm),
  };
}

export interface ForceInTons {
  kN: number;
  tonnesForce: number;
  shortTons: number;
  longTons: number;
}

/** One force in each of the tons the trade uses, each labelled by its own name (trap: three different tons). */
export function forceInTons(forceKnValue: number): ForceInTons {
  return {
    kN: forceKnValue,
    tonnesForce: convert("force", forceKnValue, "kN", "tf"),
    shortTons: convert("force", forceKnValue, "kN", "shortTon"),
    longTons: convert("force", forceKnValue, "kN", "longTon"),
  };
}
