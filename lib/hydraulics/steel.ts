/**
 * Structural steel properties. Yield drops as plate gets thicker, so the grade alone is not enough:
 * EN 10025 S235JR 235/225/215 MPa and S355JR 355/345/335 MPa for t ≤ 16 / 16–40 / 40–63 mm [EN];
 * A36 250 MPa (36 ksi) [A36]. Beyond 63 mm our table stops: the last band is used and flagged.
 */
import type { SteelGrade } from "./types";

/** Young's modulus of steel, N/mm² [HAE]. */
export const STEEL_E_N_MM2 = 210_000;

/** Upper thickness of each yield band (mm). */
const BAND_LIMITS_MM = [16, 40, 63] as const;

const YIELD_BY_BAND_MPA: Readonly<Record<SteelGrade, readonly [number, number, number]>> = {
  S235JR: [235, 225, 215],
  S355JR: [355, 345, 335],
  // The source gives one value without thickness bands; we keep to the same 63 mm table limit.
  A36: [250, 250, 250],
};

export const YIELD_TABLE_MAX_THICKNESS_MM = 63;

export interface YieldStrength {
  yieldMpa: number;
  /** False when the thickness is beyond the table (the value shown is the thickest band's). */
  covered: boolean;
}

export function yieldStrength(grade: SteelGrade, thicknessMm: number): YieldStrength {
  const bands = YIELD_BY_BAND_MPA[grade];
  const index = BAND_LIMITS_MM.findIndex((limit) => thicknessMm <= limit);
  const covered = index !== -1;
  return { yieldMpa: bands[covered ? index : bands.length - 1] ?? bands[2], covered };
}

export const STEEL_SOURCE_KEYS = { S235JR: "EN", S355JR: "EN", A36: "A36" } as const;
