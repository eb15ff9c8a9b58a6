/**
 * Frame estimates at the relief force. Plate: simply supported beam with the whole force at
 * mid-span (conservative when several cylinders spread it): M = F·L/4, σ = M/S, δ = F·L³/(48·E·I)
 * [PD], E = 210,000 N/mm² [HAE]. Columns / tie rods: each carries F / count in tension. A safety factor below 2 on yield is
 * a fail (common practice).
 */
import { makeCheck, formatFactor, type Fmt } from "./checks";
import { circleAreaMm2 } from "./force";
import { COMMON_PRACTICE, cite } from "./sources";
import { STEEL_E_N_MM2, STEEL_SOURCE_KEYS, YIELD_TABLE_MAX_THICKNESS_MM, yieldStrength } from "./steel";
import type { BuiltUpSection, Check, ColumnsInput, ColumnsResult, PlateInput, PlateResult, SolidSection, SteelGrade } from "./types";

export const FRAME_MIN_SAFETY_FACTOR = 2;

const N_PER_KN = 1000;
const NMM_PER_KNM = 1e6;

export interface Section {
  sectionModulusMm3: number;
  inertiaMm4: number;
}

/** A solid plate loaded flat: S = b·t²/6, I = b·t³/12; a built-up section brings its own. */
export function plateSection(plate: { thicknessMm: number } & (SolidSection | BuiltUpSection)): Section {
  if (plate.widthMm === undefined) {
    return { sectionModulusMm3: plate.sectionModulusMm3, inertiaMm4: plate.inertiaMm4 };
  }
  const b = plate.widthMm;
  const t = plate.thicknessMm;
  return { sectionModulusMm3: (b * t * t) / 6, inertiaMm4: (b * t ** 3) / 12 };
}

export interface BeamResult {
  momentNmm: number;
  stressMpa: number;
  deflectionMm: number;
}

/** Simply supported beam, central point load [PD]. */
export function centreLoadBeam(forceKn: number, spanMm: number, section: Section, eNmm2 = STEEL_E_N_MM2): BeamResult {
  const forceN = forceKn * N_PER_KN;
  const momentNmm = (forceN * spanMm) / 4;
  return {
    momentNmm,
    stressMpa: momentNmm / section.sectionModulusMm3,
    deflectionMm: (forceN * spanMm ** 3) / (48 * eNmm2 * section.inertiaMm4),
  };
}

export function evaluatePlate(plate: PlateInput, forceKn: number): PlateResult {
  const beam = centreLoadBeam(forceKn, plate.spanMm, plateSection(plate));
  const { yieldMpa, covered } = yieldStrength(plate.grade, plate.thicknessMm);
  return {
    role: plate.role,
    momentKnM: beam.momentNmm / NMM_PER_KNM,
    stressMpa: beam.stressMpa,
    deflectionMm: beam.deflectionMm,
    yieldMpa,
    safetyFactor: yieldMpa / beam.stressMpa,
    yieldTableCovers: covered,
  };
}

/** Tension in each column when the load is centred: F / count over the (root) area. */
export function evaluateColumns(columns: ColumnsInput, forceKn: number): ColumnsResult {
  const loadPerColumnKn = forceKn / columns.count;
  const stressMpa = (loadPerColumnKn * N_PER_KN) / circleAreaMm2(columns.diameterMm);
  // EN 10025 bands apply to a bar's diameter as its thickness.
  const { yieldMpa, covered } = yieldStrength(columns.grade, columns.diameterMm);
  return { loadPerColumnKn, stressMpa, yieldMpa, safetyFactor: yieldMpa / stressMpa, yieldTableCovers: covered };
}

export interface StrengthFigures {
  stressMpa: number;
  yieldMpa: number;
  safetyFactor: number;
  yieldTableCovers: boolean;
}

export function strengthCheck(id: string, what: string, figures: StrengthFigures, grade: SteelGrade, fmt: Fmt): Check {
  const factor = formatFactor(figures.safetyFactor);
  const head = `${what}: ${fmt("stress", figures.stressMpa)} at relief force against ${grade} yield ${fmt("stress", figures.yieldMpa)}, factor ${factor}`;
  let level: Check["level"] = "ok";
  let message = `${head}.`;
  if (figures.safetyFactor < FRAME_MIN_SAFETY_FACTOR) {
    level = "fail";
    message = `${head}, below ${FRAME_MIN_SAFETY_FACTOR}: make it stronger.`;
  } else if (!figures.yieldTableCovers) {
    level = "warn";
    message = `${head}, but our yield table stops at ${fmt("length", YIELD_TABLE_MAX_THICKNESS_MM)}; use the mill certificate's yield.`;
  }
  return makeCheck(
    id,
    level,
    message,
    `Safety factor on yield at relief force ≥ ${FRAME_MIN_SAFETY_FACTOR}; yield taken for the grade and thickness.`,
    `factor ${COMMON_PRACTICE}; yield ${cite(STEEL_SOURCE_KEYS[grade])}`,
  );
}

export function plateCheck(plate: PlateInput, result: PlateResult, fmt: Fmt): Check {
  const name = plate.role === "crosshead" ? "Crosshead" : "Bolster";
  const check = strengthCheck(`plate-${plate.role}`, `${name} bending`, result, plate.grade, fmt);
  // Deflection has no pass mark here; it is reported so the builder can judge die alignment.
  check.message += ` Mid-span deflection about ${fmt("length", result.deflectionMm)} (estimate).`;
  return check;
}

export function columnsCheck(columns: ColumnsInput, result: ColumnsResult, fmt: Fmt): Check {
  return strengthCheck("columns", `${columns.count} columns in tension`, result, columns.grade, fmt);
}
