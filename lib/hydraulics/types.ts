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
  /**
   * Oil that can be drawn before the suction pickup takes air (L): the volume between the normal
   * level and the pickup. When absent, half the tank is assumed (see reservoir.ts).
   */
  usableL?: number;
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

/** How a section is given: a solid rectangle or a built-up section's own properties. */
export interface SolidSection {
  /** Plate width across the beam (mm). */
  widthMm: number;
  sectionModulusMm3?: undefined;
  inertiaMm4?: undefined;
}
export interface BuiltUpSection {
  widthMm?: undefined;
  sectionModulusMm3: number;
  inertiaMm4: number;
}

/**
 * The moving plate (platen) the rods push and the work pushes back on: a beam with the rods'
 * point loads and the reaction spread over the die width, centred.
 */
export type PlatenInput = {
  /** Centre distance between neighbouring rods (mm); the rods sit symmetric about the die. */
  rodSpacingMm: number;
  /** Width of the die face that carries the work (mm). */
  dieWidthMm: number;
  /** Platen thickness, or the thickest element of a built-up section: it sets the yield strength. */
  thicknessMm: number;
  grade: SteelGrade;
} & (SolidSection | BuiltUpSection);

/**
 * The throat (back) of an open (C) frame: the force acts at `depthMm` from the section's neutral
 * axis, so the back carries tension F plus bending F·depth.
 */
export interface ThroatBase {
  /** Distance from the ram's axis to the neutral axis of the throat section (mm). */
  depthMm: number;
  /** Length of the back between the jaws, over which the bending opens the gap (mm). */
  heightMm: number;
  /** Plate thickness (solid) or thickest element (built-up): it sets the yield strength. */
  thicknessMm: number;
  grade: SteelGrade;
}
/** Solid back: `sectionDepthMm` measured along the throat, times the total plate thickness. */
export interface SolidThroatInput extends ThroatBase {
  sectionDepthMm: number;
  areaMm2?: undefined;
  sectionModulusMm3?: undefined;
  inertiaMm4?: undefined;
}
export interface BuiltUpThroatInput extends ThroatBase {
  sectionDepthMm?: undefined;
  areaMm2: number;
  /** Section modulus on the inner (tension) edge. */
  sectionModulusMm3: number;
  inertiaMm4: number;
}
export type ThroatInput = SolidThroatInput | BuiltUpThroatInput;

/** A die with its own force limit, from its maker or its own calculation. */
export interface DieLimitInput {
  name: string;
  maxForceKn: number;
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
  /** One plate (kept for older callers); `plates` gives crosshead and bolster together. */
  plate?: PlateInput;
  /** Crosshead and/or bolster, one of each role at most. */
  plates?: PlateInput[];
  columns?: ColumnsInput;
  platen?: PlatenInput;
  throat?: ThroatInput;
  dies?: DieLimitInput[];
}

export type CheckLevel = "ok" | "warn" | "fail";
/**
 * A design's verdict. "incomplete" means a check that makes a press safe has not run: it ranks
 * above "warn" (unknown is worse than a known concern) and below "fail".
 */
export type OverallLevel = CheckLevel | "incomplete";

/** A safety check that did not run for lack of input. */
export interface MissingCheck {
  /** Stable identifier, e.g. "rating-hose", "plate-bolster", "rod-buckling". */
  id: string;
  /** What to fill in, in our words. */
  label: string;
}

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
  /** Recommended design effective-length factor (AISC 360-22 Commentary Table C-A-7.1). */
  kFactor: number;
  /** Stroke + exposed rod (mm). */
  unsupportedLengthMm: number;
  /** Critical load by the governing method (kN). */
  criticalLoadKn: number;
  /** Relief force shared evenly by the rods (kN). */
  loadPerRodKn: number;
  safetyFactor: number;
  /** K·L / r */
  slenderness: number;
  /** λc = π·√(2E/fy): Johnson's parabola below it, Euler above. */
  transitionSlenderness: number;
  method: "euler" | "johnson";
  /** True when the rod is slender enough for Euler (method "euler"). */
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
  /** Oil the rods draw out of the tank over a full stroke (cap minus annulus volume, all cylinders). */
  drawdownL: number;
  usableL: number;
  /** True when the usable volume was not given and half the tank was assumed. */
  usableAssumed: boolean;
}

/** As a plate: momentKnM is the largest along the platen, deflectionMm the die centre's against the outer rods. */
export type PlatenResult = Omit<PlateResult, "role">;

export interface ThroatResult {
  /** Bending moment F·e at the throat (kN·m). */
  momentKnM: number;
  tensionStressMpa: number;
  bendingStressMpa: number;
  /** Tension plus bending on the inner edge. */
  stressMpa: number;
  yieldMpa: number;
  safetyFactor: number;
  yieldTableCovers: boolean;
  /** Angle the jaws open under full force (degrees). */
  openingDeg: number;
  /** Extra gap at the ram's axis from that opening (mm). */
  gapOpeningMm: number;
}

export interface DieLimitResult {
  name: string;
  maxForceKn: number;
  /** Highest gauge reading that keeps the force within the die's limit. */
  maxGaugeBar: number;
  /** True when the press at relief can exceed the die's limit. */
  exceededAtRelief: boolean;
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
  /** The first plate (kept for older callers); `plates` lists each. */
  plate?: PlateResult;
  plates?: PlateResult[];
  columns?: ColumnsResult;
  platen?: PlatenResult;
  throat?: ThroatResult;
  dies?: DieLimitResult[];
  reservoir?: ReservoirResult;
  checks: Check[];
  /** Safety checks that did not run; while any is listed `overall` is never "ok". */
  missing: MissingCheck[];
  /** Values the engine assumed because they were not given. */
  assumptions: string[];
  /** "fail" if any check fails, else "incomplete" if anything is missing, else the worst level. */
  overall: OverallLevel;
}
