/**
 * The sizing engine: one call runs the whole circuit — force, speeds, cycle, power, motor, and
 * each optional block (lines, rod buckling, ratings, reservoir, plates, columns, platen, throat,
 * dies) with its checks, and lists the safety checks that could not run (`missing`).
 * Pure TypeScript, SI-based units inside; the UI and the API call the same function.
 */
import type { UnitSystem } from "@/lib/units";
import { bucklingChecks, evaluateBuckling } from "./buckling";
import { makeFormatter, overallLevel, RELIEF_ASSUMED, sanityChecks, type Fmt } from "./checks";
import { missingChecks } from "./completeness";
import { dieChecks, evaluateDies } from "./dies";
import { forceInTons, forceKn, cylinderAreas } from "./force";
import { columnsCheck, evaluateColumns, evaluatePlate, plateCheck } from "./frame";
import { ratingChecks } from "./hoses";
import { lineChecks, lineFlows, lineVelocities } from "./lines";
import { DEFAULT_EFFICIENCY, motorCheck, motorLimits, stagePowers } from "./power";
import { platenCheck, evaluatePlaten } from "./platen";
import { drawdownL, evaluateReservoir, reservoirChecks } from "./reservoir";
import { evaluateThroat, throatCheck } from "./throat";
import { cycleTimeS, pumpFlows, ramSpeeds, type PumpFlows } from "./speed";
import type { Check, PlateInput, SizingInput, SizingResult } from "./types";
import { SizingInputError, findInputProblems } from "./validate";

export interface EvaluateOptions {
  /** Units for the numbers inside check messages; results are always SI-based. Default metric. */
  system?: UnitSystem;
}

/**
 * Sizes the whole press. Throws SizingInputError (with one problem per field) for input it cannot
 * compute from; everything computable comes back, with unwise choices flagged in `checks`.
 */
export function evaluateSizing(input: SizingInput, options: EvaluateOptions = {}): SizingResult {
  const problems = findInputProblems(input);
  if (problems.length > 0) throw new SizingInputError(problems);

  const fmt = makeFormatter(options.system ?? "metric");
  const efficiency = input.overallEfficiency ?? DEFAULT_EFFICIENCY;
  const reliefBar = input.reliefBar ?? input.pressureBar;
  const { cylinders, pump } = input;
  const { capMm2, annulusMm2 } = cylinderAreas(cylinders);
  const flows = pumpFlows(pump, input.pressureBar, reliefBar);
  const speeds = ramSpeeds(flows, capMm2, annulusMm2);
  const powers = stagePowers(pump, flows, reliefBar, efficiency);
  const force = forceInTons(forceKn(input.pressureBar, capMm2));
  const reliefForceKn = forceKn(reliefBar, capMm2);

  const result: SizingResult = {
    capAreaMm2: capMm2,
    annulusAreaMm2: annulusMm2,
    reliefBar,
    forceKn: force.kN,
    forceTonnesForce: force.tonnesForce,
    forceShortTons: force.shortTons,
    reliefForceKn,
    retractForceKn: forceKn(input.pressureBar, annulusMm2),
    advanceSpeedMmS: speeds.advanceMmS,
    pressingSpeedMmS: speeds.pressingMmS,
    retractSpeedMmS: speeds.retractMmS,
    approachPowerKw: powers.approachKw,
    pressingPowerKw: powers.pressingKw,
    motorRequiredKw: powers.motorRequiredKw,
    governingStage: powers.governingStage,
    ...(input.pressDistanceMm !== undefined && {
      cycleTimeS: cycleTimeS(cylinders.strokeMm, input.pressDistanceMm, speeds),
    }),
    ...(input.motorKw !== undefined && motorLimits(input.motorKw, pump, flows, efficiency)),
    checks: [],
    missing: [],
    assumptions: input.reliefBar === undefined ? [RELIEF_ASSUMED] : [],
    overall: "ok",
  };

  const checks: Check[] = sanityChecks(
    { pressureBar: input.pressureBar, reliefBar, efficiency, pump, cylinderCount: cylinders.count, reliefGiven: input.reliefBar !== undefined },
    fmt,
  );
  if (input.motorKw !== undefined) checks.push(motorCheck(input.motorKw, powers, fmt));
  checks.push(...optionalBlocks(input, result, flows, fmt));
  checks.push(...frameBlocks(input, result, fmt));

  result.checks = checks;
  result.missing = missingChecks(input, new Set(allPlates(input).map((p) => p.role)));
  result.overall = overallLevel(checks, result.missing);
  return result;
}

/** The single `plate` of older callers and the `plates` list, as one list. */
export function allPlates(input: Pick<SizingInput, "plate" | "plates">): PlateInput[] {
  return [...(input.plate ? [input.plate] : []), ...(input.plates ?? [])];
}

/** Plates, columns, platen, throat and dies: every member loaded by the force at relief. */
function frameBlocks(input: SizingInput, result: SizingResult, fmt: Fmt): Check[] {
  const checks: Check[] = [];
  const force = result.reliefForceKn;
  const plates = allPlates(input);
  if (plates.length > 0) {
    result.plates = plates.map((plate) => evaluatePlate(plate, force));
    result.plate = result.plates[0];
    plates.forEach((plate, i) => checks.push(plateCheck(plate, result.plates![i]!, fmt)));
  }
  if (input.columns) {
    result.columns = evaluateColumns(input.columns, force);
    checks.push(columnsCheck(input.columns, result.columns, fmt));
  }
  if (input.platen) {
    result.platen = evaluatePlaten(input.platen, input.cylinders.count, force);
    checks.push(platenCheck(input.platen, input.cylinders.count, result.platen, fmt));
  }
  if (input.throat) {
    result.throat = evaluateThroat(input.throat, force);
    checks.push(throatCheck(input.throat, result.throat, fmt));
  }
  if (input.dies && input.dies.length > 0) {
    result.dies = evaluateDies(input.dies, result.capAreaMm2, force);
    checks.push(...dieChecks(result.dies, force, fmt));
  }
  return checks;
}

/** Fills the optional parts of `result` and returns their checks. */
function optionalBlocks(input: SizingInput, result: SizingResult, flows: PumpFlows, fmt: Fmt): Check[] {
  const checks: Check[] = [];
  const { cylinders } = input;
  if (input.lines) {
    const velocities = lineVelocities(input.lines, lineFlows(flows, result.capAreaMm2, result.annulusAreaMm2));
    result.lineVelocities = velocities;
    checks.push(...lineChecks(velocities, fmt));
  }
  if (input.buckling) {
    // Even sharing assumes a centred load (see the parallel-cylinders check).
    const loadPerRodKn = result.reliefForceKn / cylinders.count;
    result.buckling = evaluateBuckling(cylinders.rodMm, cylinders.strokeMm, input.buckling, loadPerRodKn);
    checks.push(...bucklingChecks(result.buckling, input.buckling, fmt));
  }
  if (input.ratings) {
    checks.push(...ratingChecks(input.ratings, result.reliefBar, result.capAreaMm2 / result.annulusAreaMm2, fmt));
  }
  if (input.reservoir) {
    const drawL = drawdownL(result.capAreaMm2, result.annulusAreaMm2, cylinders.strokeMm);
    result.reservoir = evaluateReservoir(input.reservoir, flows.approachLpm, drawL);
    checks.push(...reservoirChecks(result.reservoir, fmt));
  }
  return checks;
}

export type * from "./types";
export { SizingInputError, findInputProblems, INPUT_LIMITS, type InputProblem } from "./validate";
export { gaugeTable, type GaugeRow, type GaugeTableInput } from "./gauge";
export {
  requiredBoreMm,
  requiredFlowLpm,
  suggestBores,
  ISO_3320_BORES_MM,
  INCH_BORES_IN,
  type BoreOption,
  type BoreChoice,
  type BoreSuggestion,
  type ForceTarget,
} from "./inverse";
export { circleAreaMm2, annulusAreaMm2, forceKn, pressureForForceBar, areaForForceMm2, forceInTons } from "./force";
export { speedMmS, flowLpmForSpeed, sweptVolumeL, cycleSplitS, type CycleSplit } from "./speed";
export { hydraulicPowerKw, motorInputKw, maxPressureForMotorBar, DEFAULT_EFFICIENCY } from "./power";
export { lineVelocityMS, lineIdForVelocityMm, LINE_RANGES_MS } from "./lines";
export { END_FIXITY_K, THEORETICAL_K, transitionSlenderness, johnsonStressMpa } from "./buckling";
export { platenBeam } from "./platen";
export { throatSection } from "./throat";
export { intensifiedBar, RELIEF_OVERRIDE_FRACTION, GAUGE_MAX_READING_FRACTION } from "./hoses";
export { yieldStrength, STEEL_E_N_MM2 } from "./steel";
export { minimumBurstBar, assemblyRatingBar, typicalHoseWorkingBar, type HoseType, type DashSize } from "./hoses";
export { recommendedOilL, recommendedTankL, drawdownL } from "./reservoir";
export { SOURCES, COMMON_PRACTICE } from "./sources";
