/**
 * Unit conversion and display formatting — the one place for both.
 *
 * Quantities are stored and computed in the base unit of their kind (mm, bar, L/min, kN, mm/s,
 * m/s, kW, MPa, L); only the edges (display, form input) see other units. Pure: no React, no I/O.
 */

export type UnitSystem = "metric" | "imperial";

export type QuantityKind =
  | "length"
  | "pressure"
  | "flow"
  | "force"
  | "speed" // ram speeds, base mm/s
  | "fluidVelocity" // oil in a line, base m/s
  | "power"
  | "stress"
  | "volume"
  | "area" // section areas, base mm²
  | "sectionModulus" // base mm³
  | "inertia"; // second moment of area, base mm⁴

// Exact definitions (hydraulics-reference.md §1 and §11).
export const MM_PER_IN = 25.4; // international inch, exact
export const L_PER_US_GAL = 3.785411784; // 231 in³, exact [FDSD]
export const N_PER_LBF = 4.4482216152605; // exact [LBF]
export const PA_PER_BAR = 1e5;
/** lbf / in², derived from the two exact factors above: 6,894.757293168… Pa. */
export const PA_PER_PSI = N_PER_LBF / (MM_PER_IN / 1000) ** 2;
export const KN_PER_TONNE_FORCE = 9.80665; // 1000 kg × standard gravity, exact [TF]
export const LBF_PER_SHORT_TON = 2000; // US ton-force [TF]
export const LBF_PER_LONG_TON = 2240; // UK ton-force [TF]
/** Mechanical horsepower, 550 ft·lbf/s: 745.69987158… W. */
export const W_PER_HP = 550 * 0.3048 * N_PER_LBF;

const KN_PER_LBF = N_PER_LBF / 1000;
const BAR_PER_PSI = PA_PER_PSI / PA_PER_BAR;
const MPA_PER_PSI = PA_PER_PSI / 1e6;

export interface UnitDef {
  readonly symbol: string;
  readonly name: string;
  /** How many base units of the kind one of this unit is. */
  readonly toBase: number;
}

const def = (symbol: string, name: string, toBase: number): UnitDef => ({ symbol, name, toBase });

const UNITS = {
  length: {
    mm: def("mm", "millimetre", 1),
    m: def("m", "metre", 1000),
    in: def("in", "inch", MM_PER_IN),
    ft: def("ft", "foot", 12 * MM_PER_IN),
  },
  pressure: {
    bar: def("bar", "bar", 1),
    kPa: def("kPa", "kilopascal", 1e3 / PA_PER_BAR),
    MPa: def("MPa", "megapascal", 1e6 / PA_PER_BAR),
    psi: def("psi", "pound-force per square inch", BAR_PER_PSI),
  },
  flow: {
    "L/min": def("L/min", "litre per minute", 1),
    gpm: def("US gpm", "US gallon per minute", L_PER_US_GAL),
  },
  force: {
    kN: def("kN", "kilonewton", 1),
    N: def("N", "newton", 1e-3),
    lbf: def("lbf", "pound-force", KN_PER_LBF),
    tf: def("t(f)", "tonne-force (metric, 1000 kgf)", KN_PER_TONNE_FORCE),
    shortTon: def("US tonf", "short ton-force (US, 2000 lbf)", LBF_PER_SHORT_TON * KN_PER_LBF),
    longTon: def("UK tonf", "long ton-force (UK, 2240 lbf)", LBF_PER_LONG_TON * KN_PER_LBF),
  },
  speed: {
    "mm/s": def("mm/s", "millimetre per second", 1),
    "m/s": def("m/s", "metre per second", 1000),
    "in/s": def("in/s", "inch per second", MM_PER_IN),
    "ft/s": def("ft/s", "foot per second", 12 * MM_PER_IN),
  },
  fluidVelocity: {
    "m/s": def("m/s", "metre per second", 1),
    "ft/s": def("ft/s", "foot per second", (12 * MM_PER_IN) / 1000),
  },
  power: {
    kW: def("kW", "kilowatt", 1),
    W: def("W", "watt", 1e-3),
    hp: def("hp", "horsepower (mechanical)", W_PER_HP / 1000),
  },
  stress: {
    MPa: def("MPa", "megapascal (N/mm²)", 1),
    psi: def("psi", "pound-force per square inch", MPA_PER_PSI),
    ksi: def("ksi", "thousand psi", 1000 * MPA_PER_PSI),
  },
  volume: {
    L: def("L", "litre", 1),
    gal: def("US gal", "US gallon", L_PER_US_GAL),
    in3: def("in³", "cubic inch", MM_PER_IN ** 3 / 1e6),
  },
  area: {
    mm2: def("mm²", "square millimetre", 1),
    in2: def("in²", "square inch", MM_PER_IN ** 2),
  },
  sectionModulus: {
    mm3: def("mm³", "cubic millimetre", 1),
    in3: def("in³", "cubic inch", MM_PER_IN ** 3),
  },
  inertia: {
    mm4: def("mm⁴", "millimetre to the fourth", 1),
    in4: def("in⁴", "inch to the fourth", MM_PER_IN ** 4),
  },
} as const satisfies Record<QuantityKind, Record<string, UnitDef>>;

export type UnitId<K extends QuantityKind> = keyof (typeof UNITS)[K] & string;

/** The unit each kind is shown in per unit system. */
const DISPLAY: { readonly [S in UnitSystem]: { readonly [K in QuantityKind]: UnitId<K> } } = {
  metric: {
    length: "mm",
    pressure: "bar",
    flow: "L/min",
    force: "kN",
    speed: "mm/s",
    fluidVelocity: "m/s",
    power: "kW",
    stress: "MPa",
    volume: "L",
    area: "mm2",
    sectionModulus: "mm3",
    inertia: "mm4",
  },
  imperial: {
    length: "in",
    pressure: "psi",
    flow: "gpm",
    force: "shortTon", // US presses are rated in short tons [ITI]
    speed: "in/s",
    fluidVelocity: "ft/s",
    power: "hp",
    stress: "ksi",
    volume: "gal",
    area: "in2",
    sectionModulus: "in3",
    inertia: "in4",
  },
};

// A widened view for lookups by string; the typed API above keeps callers honest.
const TABLE: Record<QuantityKind, Record<string, UnitDef | undefined>> = UNITS;

export function unitDef<K extends QuantityKind>(kind: K, unit: UnitId<K>): UnitDef {
  const found = TABLE[kind][unit];
  if (!found) throw new RangeError(`Unknown ${kind} unit: ${unit}`);
  return found;
}

/** All unit ids of a kind, e.g. for a unit picker. */
export function unitsOf<K extends QuantityKind>(kind: K): UnitId<K>[] {
  return Object.keys(UNITS[kind]) as UnitId<K>[];
}

export function convert<K extends QuantityKind>(kind: K, value: number, from: UnitId<K>, to: UnitId<K>): number {
  if (from === to) return value;
  return (value * unitDef(kind, from).toBase) / unitDef(kind, to).toBase;
}

/** Base-unit value → the given unit. */
export function fromBase<K extends QuantityKind>(kind: K, baseValue: number, unit: UnitId<K>): number {
  return baseValue / unitDef(kind, unit).toBase;
}

/** Value in the given unit → base unit. */
export function toBase<K extends QuantityKind>(kind: K, value: number, unit: UnitId<K>): number {
  return value * unitDef(kind, unit).toBase;
}

export function displayUnitId<K extends QuantityKind>(kind: K, system: UnitSystem): UnitId<K> {
  return DISPLAY[system][kind];
}

export function displayUnit(kind: QuantityKind, system: UnitSystem): UnitDef {
  return unitDef(kind, displayUnitId(kind, system));
}

/** Base-unit value → number in the system's display unit. */
export function toDisplay(kind: QuantityKind, baseValue: number, system: UnitSystem): number {
  return fromBase(kind, baseValue, displayUnitId(kind, system));
}

/** Number typed in the system's display unit → base unit (for form inputs). */
export function fromDisplay(kind: QuantityKind, displayValue: number, system: UnitSystem): number {
  return toBase(kind, displayValue, displayUnitId(kind, system));
}

const MAX_DECIMALS = 6;

/**
 * Rounds to `significant` digits but never drops integer digits (31,416 stays 31,416), groups
 * thousands with commas, and shows "—" for a non-finite value.
 */
export function formatNumber(value: number, significant = 3): string {
  if (!Number.isFinite(value)) return "—";
  if (value === 0) return "0";
  let text: string;
  if (Math.floor(Math.log10(Math.abs(value))) >= significant - 1) {
    text = Math.round(value).toString();
  } else {
    const rounded = Number(value.toPrecision(significant));
    const magnitude = Math.floor(Math.log10(Math.abs(rounded)));
    const decimals = Math.min(MAX_DECIMALS, Math.max(0, significant - 1 - magnitude));
    text = rounded.toFixed(decimals);
  }
  const negative = text.charCodeAt(0) === 45; // "-"
  if (negative && /^-0(\.0*)?$/.test(text)) text = text.slice(1);
  // Most figures have three integer digits or fewer: no grouping, no regex (the engine formats
  // dozens of numbers per evaluation, and this is its hottest path).
  const dot = text.indexOf(".");
  if ((dot === -1 ? text.length : dot) - (negative ? 1 : 0) <= 3) return text;
  const [whole = "", fraction] = text.split(".");
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ",");
  return fraction === undefined ? grouped : `${grouped}.${fraction}`;
}

export interface FormatOptions<K extends QuantityKind> {
  /** Show in this unit instead of the system's display unit. */
  unit?: UnitId<K>;
  significant?: number;
}

/** "139.75 kN stored" → "140 kN" (metric) or "15.7 US tonf" (imperial). */
export function formatQuantity<K extends QuantityKind>(
  kind: K,
  baseValue: number,
  system: UnitSystem,
  options: FormatOptions<K> = {},
): string {
  const unit = options.unit ?? displayUnitId(kind, system);
  const shown = fromBase(kind, baseValue, unit);
  return `${formatNumber(shown, options.significant)} ${unitDef(kind, unit).symbol}`;
}

const NUMBER_PATTERN = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;

/** Parses a typed number ("12.5", " 3e2 "); null when empty or not a plain number. */
export function parseNumberInput(text: string): number | null {
  const trimmed = text.trim();
  if (!NUMBER_PATTERN.test(trimmed)) return null;
  const value = Number(trimmed);
  return Number.isFinite(value) ? value : null;
}

/** Form input typed in the system's display unit → base unit, or null if not a number. */
export function parseDisplayInput(kind: QuantityKind, text: string, system: UnitSystem): number | null {
  const value = parseNumberInput(text);
  return value === null ? null : fromDisplay(kind, value, system);
}

const INPUT_SIGNIFICANT = 6;

/**
 * Base-unit value → text for a form input in the system's display unit: 6 significant digits,
 * no grouping, so it parses back (4 in ↔ 101.6 mm exactly; 2500 psi → 172.369 bar).
 */
export function formatInputValue(kind: QuantityKind, baseValue: number, system: UnitSystem): string {
  const shown = toDisplay(kind, baseValue, system);
  return Number.isFinite(shown) ? String(Number(shown.toPrecision(INPUT_SIGNIFICANT))) : "";
}
