/**
 * Input and result shapes of the sizing engine. SI-based units are named in every field:
 * mm, mm² (areas), bar, L/min, kN, kW, MPa (= N/mm²), mm/s, m/s (oil in lines), L, s.
 */

/** Identical cylinders in parallel, all at one pressure; they share the load evenly only if it is centred. */
export interface CylinderInput {
  /** 1–8 */
  count: number;
  boreMm: number;
  rodMm: number;
  strokeMm: number;
}

export interface SinglePumpInput {
  kind: "single";
  flowLpm: number;
}

/**
 * High-low (two-stage) pump. Below `unloadBar` both sections feed the cylinders, so
 * `approachFlowLpm` is the TOTAL flow of both sections. At `unloadBar` the large section dumps to
 * tank and only the small one continues: `pressingFlowLpm` is the small section's flow alone.
 */
export interface TwoStagePumpInput {
  kind: "two-stage";
  approachFlowLpm: number;
  pressingFlowLpm: number;
  unloadBar: number;
}

export type PumpInput = SinglePumpInput | TwoStagePumpInput;

/** Inside diameters of the lines; each one given adds a velocity check. */
export interface LinesInput {
  suctionIdMm?: number;
  pressureIdMm?: number;
  returnIdMm?: number;
}

export type EndFixity = "fixed-fixed" | "fixed-pinned" | "pinned-pinned" | "fixed-free";

export interface BucklingInput {
  endFixity: EndFixity;
  /** Rod length outside the cylinder at full retraction (mm); added to the stroke. */
  exposedRodMm: number;
  /** Yield of the rod steel; when absent a conservative 235 MPa is assumed (see buckling.ts). */
  rodYieldMpa?: number;
}

/** Pressure ratings printed on the parts (bar). The hose rating is the assembly's: lower of hose and fittings. */
export interface RatingsInput {
  hoseBar?: number;
  valveBar?: number;
  pumpBar?: number;
  cylinderBar?: number;
  /** Full-scale reading of the gauge. */
  gaugeBar?: number;
}

export interface ReservoirInput {
  /** Tank volume (L). */
  volumeL: number;
}

export type SteelGrade = "S235JR" | "S355JR" | "A36";

interface PlateBase {
  role: "crosshead" | "bolster";
  /** Distance between supports (mm). */
  spanMm: number;
  /** Plate thickness, or the thickest element of a built-up section: it sets the yield strength. */
  thicknessMm: number;
  grade: SteelGrade;
}

/** A solid plate loaded flat: the section follows from width × thickness. */
export interface SolidPlateInput extends PlateBase {
  widthMm: number;
  sectionModulusMm3?: undefined;
  inertiaMm4?: undefined;
}

/** A built-up section (bars on edge, channels, I-beams) given by its own properties. */
export interface SectionPlateInput extends PlateBase {
  widthMm?: undefined;
  sectionModulusMm3: number;
  inertiaMm4: number;
}

export type PlateInput = SolidPlateInput | SectionPlateInput;

/** Side columns or tie rods; for threaded rods give the thread's root (minor) diameter. */
export interface ColumnsInput {
  count: number;
  diameterMm: number;
  grade: SteelGrade;
}

export interface SizingInput {
  cylinders: CylinderInput;
  pump: PumpInput;
  /** Overall pump efficiency, 0–1; default 0.85. */
  overallEfficiency?: number;
  /** Working pressure (gauge, bar). */
  pressureBar: number;
  /** Relief setting (bar); defaults to the working pressure. */
  reliefBar?: number;
  motorKw?: number;
  /** Length of the stroke done at pressing speed (mm), for the cycle time. */
  pressDistanceMm?: number;
  lines?: LinesInput;
  buckling?: BucklingInput;
  ratings?: RatingsInput;
  reservoir?: ReservoirInput;
  plate?: PlateInput;
  columns?: ColumnsInput;
}

export type CheckLevel = "ok" | "warn" | "fail";

export interface Check {
  /** Stable identifier, e.g. "rating-hose". */
  id: string;
  level: CheckLevel;
  /** What was found, in the user's units. */
  message: string;
  /** The rule applied, in our words. */
  rule: string;
  /** Where the rule comes from. */
  source: string;
}

export type LineName = "suction" | "pressure" | "return";

export interface LineVelocity {
  idMm: number;
  flowLpm: number;
  velocityMS: number;
  /** Recommended range (m/s). */
  rangeMS: readonly [number, number];
}

export type LineVelocities = Partial<Record<LineName, LineVelocity>>;

export interface BucklingResult {
  kFactor: number;
  /** Stroke + exposed rod (mm). */
  unsupportedLengthMm: number;
  criticalLoadKn: number;
  /** Relief force shared evenly by the rods (kN). */
  loadPerRodKn: number;
  safetyFactor: number;
  /** K·L / r */
  slenderness: number;
  /** False when the rod is too stocky for Euler; direct stress governs then. */
  eulerApplies: boolean;
  directStressMpa: number;
  rodYieldMpa: number;
  directSafetyFactor: number;
}

export interface PlateResult {
  role: "crosshead" | "bolster";
  momentKnM: number;
  stressMpa: number;
  deflectionMm: number;
  yieldMpa: number;
  safetyFactor: number;
  /** False when the thickness is beyond the yield table. */
  yieldTableCovers: boolean;
}

export interface ColumnsResult {
  loadPerColumnKn: number;
  stressMpa: number;
  yieldMpa: number;
  safetyFactor: number;
  yieldTableCovers: boolean;
}

export interface ReservoirResult {
  volumeL: number;
  recommendedOilL: number;
  recommendedTankL: number;
}

export interface SizingResult {
  /** Total cap-end (extend) area of all cylinders, mm². */
  capAreaMm2: number;
  /** Total annulus (retract) area of all cylinders, mm². */
  annulusAreaMm2: number;
  reliefBar: number;
  /** Extend force at the working pressure. */
  forceKn: number;
  forceTonnesForce: number;
  forceShortTons: number;
  /** Extend force at the relief setting: the press's rating and the frame's load. */
  reliefForceKn: number;
  /** Retract force on the annulus at the working pressure. */
  retractForceKn: number;
  advanceSpeedMmS: number;
  pressingSpeedMmS: number;
  retractSpeedMmS: number;
  /** Advance over (stroke − press distance), press over the press distance, retract over the full stroke. */
  cycleTimeS?: number;
  approachPowerKw: number;
  pressingPowerKw: number;
  motorRequiredKw: number;
  governingStage: "approach" | "pressing";
  /** Highest pressure the given motor can hold at the pressing flow. */
  maxPressureForMotorBar?: number;
  /** Two-stage only: highest unloading pressure the given motor can drive at the total flow. */
  maxUnloadForMotorBar?: number;
  lineVelocities?: LineVelocities;
  buckling?: BucklingResult;
  plate?: PlateResult;
  columns?: ColumnsResult;
  reservoir?: ReservoirResult;
  checks: Check[];
  /** Worst level of all checks. */
  overall: CheckLevel;
}
