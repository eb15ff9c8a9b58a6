/** Shared test helpers: tolerances as hydraulics-reference.md sets them, and imperial ↔ SI shortcuts. */
import { expect } from "vitest";
import { convert, MM_PER_IN } from "@/lib/units";

/** ±0.1 % by default: the tolerance for values computed from a formula. */
export function expectRel(actual: number, expected: number, rel = 1e-3): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(Math.abs(expected) * rel);
}

/** Published values: ours, rounded as the source printed it, equals the printed figure. */
export function expectPrinted(actual: number, printed: number, decimals: number): void {
  const scale = 10 ** decimals;
  expect(Math.round(actual * scale) / scale).toBeCloseTo(printed, Math.max(decimals, 0) + 6);
}

export const inToMm = (inches: number): number => inches * MM_PER_IN;
export const mmToIn = (mm: number): number => mm / MM_PER_IN;
export const in2FromMm2 = (mm2: number): number => mm2 / MM_PER_IN ** 2;
export const mm2FromIn2 = (in2: number): number => in2 * MM_PER_IN ** 2;
export const psiToBar = (psi: number): number => convert("pressure", psi, "psi", "bar");
export const barToPsi = (bar: number): number => convert("pressure", bar, "bar", "psi");
export const gpmToLpm = (gpm: number): number => convert("flow", gpm, "gpm", "L/min");
export const knToLbf = (kn: number): number => convert("force", kn, "kN", "lbf");
export const lbfToKn = (lbf: number): number => convert("force", lbf, "lbf", "kN");
export const kwToHp = (kw: number): number => convert("power", kw, "kW", "hp");
export const mpaToPsi = (mpa: number): number => convert("stress", mpa, "MPa", "psi");
export const psiToMpa = (psi: number): number => convert("stress", psi, "psi", "MPa");
