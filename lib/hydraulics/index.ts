/**
 * The sizing engine: one call runs the whole circuit — force, speeds, cycle, power, motor, and
 * each optional block (lines, rod buckling, ratings, reservoir, plate, columns) with its checks.
 * Pure TypeScript, SI-based units inside; the UI and the API call the same function.
 */
import type { UnitSystem } from "@/lib/units";
import { bucklingChecks, evaluateBuckling } from "./buckling";
import { makeFormatter, sanityChecks, worstLevel, type Fmt } from "./checks";
import { forceInTons, forceKn, cylinderAreas } from "./force";
import { columnsCheck, evaluateColumns, evaluatePlate, plateCheck } from "./frame";
import { ratingChecks } from "./hoses";
import { lineChecks, lineFlows, lineVelocities } from "./lines";
import { DEFAULT_EFFICIENCY, motorCheck, motorLimits, stagePowers } from "./power";
import { evaluateReservoir, reservoirCheck } from "./reservoir";
import { cycleTimeS, pumpFlows, ramSpeeds, type PumpFlows } from "./speed";
import type { Check, SizingInput, SizingResult } from "./types";
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
  const flows = pumpFlows(pump);
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
    overall: "ok",
  };

  const checks: Check[] = sanityChecks(
    { pressureBar: input.pressureBar, reliefBar, efficiency, pump, cylinderCount: cylinders.count },
    fmt,
  );
  if (input.motorKw !== undefined) checks.push(motorCheck(input.motorKw, powers, fmt));
  checks.push(...optionalBlocks(input, result, flows, fmt));

  result.checks = checks;
  result.overall = worstLevel(checks);
  return result;
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
  if (input.ratings) checks.push(...ratingChecks(input.ratings, result.reliefBar, fmt));
  if (input.reservoir) {
    result.reservoir = evaluateReservoir(input.reservoir.volumeL, flows.approachLpm);
    checks.push(reservoirCheck(result.reservoir, fmt));
  }
  if (input.plate) {
    result.plate = evaluatePlate(input.plate, result.reliefForceKn);
    checks.push(plateCheck(input.plate, result.plate, fmt));
  }
  if (input.columns) {
    result.columns = evaluateColumns(input.columns, result.reliefForceKn);
    checks.push(columnsCheck(input.columns, result.columns, fmt));
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
export { END_FIXITY_K } from "./buckling";
export { yieldStrength, STEEL_E_N_MM2 } from "./steel";
export { minimumBurstBar, assemblyRatingBar, typicalHoseWorkingBar, type HoseType, type DashSize } from "./hoses";
export { recommendedOilL, recommendedTankL } from "./reservoir";
export { SOURCES, COMMON_PRACTICE } from "./sources";
