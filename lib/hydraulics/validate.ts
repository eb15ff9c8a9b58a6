/**
 * Input the engine cannot compute from (a zero bore, a rod as big as the bore, NaN) is refused with
 * one problem per field. Unwise but computable designs (relief below working pressure, a weak
 * plate) are not refused: they come back as failing checks. The bounds are our own sanity limits,
 * far beyond any home-built press either way, which keep every result finite.
 */
import type { PlateInput, PlatenInput, SizingInput, ThroatInput } from "./types";

// Runtime lists of the string unions, for callers that bypass the types (plain JS, JSON).
const GRADES = ["S235JR", "S355JR", "A36"] as const;
const FIXITIES = ["fixed-fixed", "fixed-pinned", "pinned-pinned", "fixed-free"] as const;
const PLATE_ROLES = ["crosshead", "bolster"] as const;
const PUMP_KINDS = ["single", "two-stage"] as const;

export interface InputProblem {
  /** Dotted path of the field, e.g. "cylinders.rodMm". */
  path: string;
  message: string;
}

export class SizingInputError extends Error {
  readonly problems: InputProblem[];
  constructor(problems: InputProblem[]) {
    super(`Invalid sizing input: ${problems.map((p) => `${p.path}: ${p.message}`).join("; ")}`);
    this.name = "SizingInputError";
    this.problems = problems;
  }
}

/** Sanity limits per field, [lowest, highest], both allowed. */
export const INPUT_LIMITS = {
  cylinderCount: [1, 8],
  diameterMm: [1, 2000],
  strokeMm: [1, 10_000],
  flowLpm: [0.01, 10_000],
  pressureBar: [0.1, 2000],
  efficiency: [0.1, 1],
  motorKw: [0.01, 10_000],
  lineIdMm: [1, 1000],
  exposedRodMm: [0, 10_000],
  yieldMpa: [1, 3000],
  ratingBar: [0.1, 10_000],
  volumeL: [0.1, 1_000_000],
  plateMm: [1, 100_000],
  sectionModulusMm3: [1, 1e12],
  inertiaMm4: [1, 1e15],
  columnCount: [1, 64],
  areaMm2: [1, 1e10],
  forceKn: [0.01, 1e6],
  dieCount: [0, 20],
  dieNameLength: [1, 80],
} as const satisfies Record<string, readonly [number, number]>;

/** A rod must leave at least this much annulus (mm on the diameter) for the cylinder to retract. */
export const MIN_BORE_MINUS_ROD_MM = 1;

type Limit = readonly [number, number];

class Collector {
  readonly problems: InputProblem[] = [];

  range(path: string, value: number | undefined, [min, max]: Limit, integer = false): void {
    if (typeof value !== "number" || !Number.isFinite(value)) return this.add(path, "must be a finite number");
    if (integer && !Number.isInteger(value)) return this.add(path, "must be a whole number");
    if (value < min || value > max) this.add(path, `must be ${min}–${max}`);
  }

  optional(path: string, value: number | undefined, limit: Limit): void {
    if (value !== undefined) this.range(path, value, limit);
  }

  oneOf(path: string, value: unknown, allowed: readonly string[]): void {
    if (typeof value !== "string" || !allowed.includes(value)) this.add(path, `must be one of ${allowed.join(", ")}`);
  }

  add(path: string, message: string): void {
    this.problems.push({ path, message });
  }
}

export function findInputProblems(input: SizingInput): InputProblem[] {
  const c = new Collector();
  checkCylindersAndPump(c, input);
  checkPressuresAndMotor(c, input);
  checkOptionalBlocks(c, input);
  return c.problems;
}

const L = INPUT_LIMITS;

function checkCylindersAndPump(c: Collector, { cylinders: cyl, pump }: SizingInput): void {
  c.range("cylinders.count", cyl.count, L.cylinderCount, true);
  c.range("cylinders.boreMm", cyl.boreMm, L.diameterMm);
  c.range("cylinders.rodMm", cyl.rodMm, L.diameterMm);
  if (cyl.boreMm - cyl.rodMm < MIN_BORE_MINUS_ROD_MM) {
    c.add("cylinders.rodMm", `must be at least ${MIN_BORE_MINUS_ROD_MM} mm smaller than the bore`);
  }
  c.range("cylinders.strokeMm", cyl.strokeMm, L.strokeMm);

  c.oneOf("pump.kind", pump.kind, PUMP_KINDS);
  if (pump.kind === "single") {
    c.range("pump.flowLpm", pump.flowLpm, L.flowLpm);
    return;
  }
  c.range("pump.approachFlowLpm", pump.approachFlowLpm, L.flowLpm);
  c.range("pump.pressingFlowLpm", pump.pressingFlowLpm, L.flowLpm);
  // The approach flow is both sections together, so it can never be less than the small one.
  if (pump.pressingFlowLpm > pump.approachFlowLpm) {
    c.add("pump.pressingFlowLpm", "must not exceed the approach (total) flow");
  }
  c.range("pump.unloadBar", pump.unloadBar, L.pressureBar);
}

function checkPressuresAndMotor(c: Collector, input: SizingInput): void {
  c.optional("overallEfficiency", input.overallEfficiency, L.efficiency);
  c.range("pressureBar", input.pressureBar, L.pressureBar);
  c.optional("reliefBar", input.reliefBar, L.pressureBar);
  c.optional("motorKw", input.motorKw, L.motorKw);
  c.optional("pressDistanceMm", input.pressDistanceMm, [0, input.cylinders.strokeMm]);
}

function checkOptionalBlocks(c: Collector, input: SizingInput): void {
  const lines = input.lines ?? {};
  c.optional("lines.suctionIdMm", lines.suctionIdMm, L.lineIdMm);
  c.optional("lines.pressureIdMm", lines.pressureIdMm, L.lineIdMm);
  c.optional("lines.returnIdMm", lines.returnIdMm, L.lineIdMm);
  if (input.buckling) {
    c.oneOf("buckling.endFixity", input.buckling.endFixity, FIXITIES);
    c.range("buckling.exposedRodMm", input.buckling.exposedRodMm, L.exposedRodMm);
    c.optional("buckling.rodYieldMpa", input.buckling.rodYieldMpa, L.yieldMpa);
  }
  for (const [key, value] of Object.entries(input.ratings ?? {})) {
    c.optional(`ratings.${key}`, value, L.ratingBar);
  }
  if (input.reservoir) c.range("reservoir.volumeL", input.reservoir.volumeL, L.volumeL);
  if (input.reservoir) c.optional("reservoir.usableL", input.reservoir.usableL, [0, input.reservoir.volumeL]);
  if (input.plate) checkPlate(c, "plate", input.plate);
  const roles = new Set<string>(input.plate ? [input.plate.role] : []);
  (input.plates ?? []).forEach((plate, i) => {
    checkPlate(c, `plates.${i}`, plate);
    if (roles.has(plate.role)) c.add(`plates.${i}.role`, "must differ from the other plates' roles");
    roles.add(plate.role);
  });
  if (input.platen) checkPlaten(c, input.platen);
  if (input.throat) checkThroat(c, input.throat);
  if (input.dies) {
    if (input.dies.length > L.dieCount[1]) c.add("dies", `must list at most ${L.dieCount[1]} dies`);
    input.dies.forEach((die, i) => {
      if (typeof die.name !== "string" || die.name.trim().length < 1 || die.name.length > L.dieNameLength[1]) c.add(`dies.${i}.name`, `must be 1–${L.dieNameLength[1]} characters`);
      c.range(`dies.${i}.maxForceKn`, die.maxForceKn, L.forceKn);
    });
  }
  if (input.columns) {
    c.oneOf("columns.grade", input.columns.grade, GRADES);
    c.range("columns.count", input.columns.count, L.columnCount, true);
    c.range("columns.diameterMm", input.columns.diameterMm, L.diameterMm);
  }
}

/** A solid width, or both the section modulus and the moment of inertia. */
function checkSection(c: Collector, path: string, s: { widthMm?: number; sectionModulusMm3?: number; inertiaMm4?: number }): void {
  if (s.widthMm !== undefined) {
    c.range(`${path}.widthMm`, s.widthMm, L.plateMm);
  } else {
    c.range(`${path}.sectionModulusMm3`, s.sectionModulusMm3, L.sectionModulusMm3);
    c.range(`${path}.inertiaMm4`, s.inertiaMm4, L.inertiaMm4);
  }
}

function checkPlate(c: Collector, path: string, plate: PlateInput): void {
  c.oneOf(`${path}.role`, plate.role, PLATE_ROLES);
  c.oneOf(`${path}.grade`, plate.grade, GRADES);
  c.range(`${path}.spanMm`, plate.spanMm, L.plateMm);
  c.range(`${path}.thicknessMm`, plate.thicknessMm, L.plateMm);
  checkSection(c, path, plate);
}

function checkPlaten(c: Collector, platen: PlatenInput): void {
  c.oneOf("platen.grade", platen.grade, GRADES);
  c.range("platen.rodSpacingMm", platen.rodSpacingMm, L.plateMm);
  c.range("platen.dieWidthMm", platen.dieWidthMm, L.plateMm);
  c.range("platen.thicknessMm", platen.thicknessMm, L.plateMm);
  checkSection(c, "platen", platen);
}

function checkThroat(c: Collector, throat: ThroatInput): void {
  c.oneOf("throat.grade", throat.grade, GRADES);
  c.range("throat.depthMm", throat.depthMm, L.plateMm);
  c.range("throat.heightMm", throat.heightMm, L.plateMm);
  c.range("throat.thicknessMm", throat.thicknessMm, L.plateMm);
  if (throat.sectionDepthMm !== undefined) {
    c.range("throat.sectionDepthMm", throat.sectionDepthMm, L.plateMm);
    return;
  }
  c.range("throat.areaMm2", throat.areaMm2, L.areaMm2);
  c.range("throat.sectionModulusMm3", throat.sectionModulusMm3, L.sectionModulusMm3);
  c.range("throat.inertiaMm4", throat.inertiaMm4, L.inertiaMm4);
}
