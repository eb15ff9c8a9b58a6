/**
 * The calculator's form: what the user typed (text, in their display units), how it becomes the
 * engine's SI input, and how the text follows a switch of unit system. Pure, so it is tested
 * without a browser.
 */
import type { EndFixity, SteelGrade } from "@/lib/hydraulics/types";
import { formatInputValue, parseDisplayInput, parseNumberInput, type QuantityKind, type UnitSystem } from "@/lib/units";
import { IMPERIAL_DEFAULTS } from "./imperial-defaults";

export type FieldKind = QuantityKind | "count" | "percent";
export type BlockId = "lines" | "buckling" | "ratings" | "reservoir" | "plate" | "bolster" | "columns" | "platen" | "throat" | "die";
export type SectionMode = "solid" | "built-up";

export interface FieldDef {
  label: string;
  kind: FieldKind;
  /** Dotted path in SizingInput, as the schema reports it. */
  path: string;
  /** Default value in SI ("" leaves it blank). */
  initial: number | "";
}

const f = (label: string, kind: FieldKind, path: string, initial: number | ""): FieldDef => ({ label, kind, path, initial });

// Defaults: an invented 25 t(f) shop press — one 125 mm cylinder at 200 bar on a two-stage pump.
export const FIELDS = {
  count: f("Cylinders in parallel", "count", "cylinders.count", 1),
  boreMm: f("Bore", "length", "cylinders.boreMm", 125),
  rodMm: f("Rod diameter", "length", "cylinders.rodMm", 70),
  strokeMm: f("Stroke", "length", "cylinders.strokeMm", 250),
  flowLpm: f("Pump flow", "flow", "pump.flowLpm", 12),
  approachFlowLpm: f("Approach flow (both sections)", "flow", "pump.approachFlowLpm", 40),
  pressingFlowLpm: f("Pressing flow (small section)", "flow", "pump.pressingFlowLpm", 9),
  unloadBar: f("Unloading pressure", "pressure", "pump.unloadBar", 40),
  efficiencyPct: f("Overall pump efficiency", "percent", "overallEfficiency", 0.85),
  pressureBar: f("Working pressure", "pressure", "pressureBar", 200),
  reliefBar: f("Relief valve setting", "pressure", "reliefBar", 210),
  motorKw: f("Motor power", "power", "motorKw", 5.5),
  pressDistanceMm: f("Distance pressed per cycle", "length", "pressDistanceMm", 50),
  suctionIdMm: f("Suction line ID", "length", "lines.suctionIdMm", 25.4),
  pressureIdMm: f("Pressure line ID", "length", "lines.pressureIdMm", 12.7),
  returnIdMm: f("Return line ID", "length", "lines.returnIdMm", 19.05),
  exposedRodMm: f("Exposed rod at full retraction", "length", "buckling.exposedRodMm", 100),
  rodYieldMpa: f("Rod steel yield", "stress", "buckling.rodYieldMpa", ""),
  hoseBar: f("Hose assembly rating", "pressure", "ratings.hoseBar", 275),
  valveBar: f("Directional valve rating", "pressure", "ratings.valveBar", 250),
  pumpBar: f("Pump rating", "pressure", "ratings.pumpBar", 250),
  cylinderBar: f("Cylinder rating", "pressure", "ratings.cylinderBar", 250),
  gaugeBar: f("Gauge full scale", "pressure", "ratings.gaugeBar", 400),
  volumeL: f("Tank volume", "volume", "reservoir.volumeL", 150),
  usableL: f("Usable above the suction pickup (blank: half the tank)", "volume", "reservoir.usableL", ""),
  // The crosshead is sent as `plate`, the bolster as `plates[0]`, so each keeps one error path.
  plateSpanMm: f("Span between supports", "length", "plate.spanMm", 300),
  plateWidthMm: f("Plate width", "length", "plate.widthMm", 250),
  plateThicknessMm: f("Plate thickness", "length", "plate.thicknessMm", 60),
  plateModulusMm3: f("Section modulus", "sectionModulus", "plate.sectionModulusMm3", 400_000),
  plateInertiaMm4: f("Second moment of area", "inertia", "plate.inertiaMm4", 40_000_000),
  bolsterSpanMm: f("Span between supports", "length", "plates.0.spanMm", 300),
  bolsterWidthMm: f("Plate width", "length", "plates.0.widthMm", 250),
  bolsterThicknessMm: f("Plate thickness", "length", "plates.0.thicknessMm", 60),
  bolsterModulusMm3: f("Section modulus", "sectionModulus", "plates.0.sectionModulusMm3", 400_000),
  bolsterInertiaMm4: f("Second moment of area", "inertia", "plates.0.inertiaMm4", 40_000_000),
  columnsCount: f("Number of columns or tie rods", "count", "columns.count", 4),
  columnsDiameterMm: f("Diameter (threads: root diameter)", "length", "columns.diameterMm", 40),
  platenRodSpacingMm: f("Rod spacing (centre to centre)", "length", "platen.rodSpacingMm", 300),
  platenDieWidthMm: f("Die width", "length", "platen.dieWidthMm", 100),
  platenWidthMm: f("Platen width", "length", "platen.widthMm", 250),
  platenThicknessMm: f("Platen thickness", "length", "platen.thicknessMm", 60),
  throatDepthMm: f("Throat depth (ram axis to the back's centre)", "length", "throat.depthMm", 200),
  throatHeightMm: f("Back length between the jaws", "length", "throat.heightMm", 500),
  throatSectionDepthMm: f("Back section depth", "length", "throat.sectionDepthMm", 300),
  throatThicknessMm: f("Back plate thickness (total)", "length", "throat.thicknessMm", 50),
  dieMaxForceKn: f("Die force limit", "force", "dies.0.maxForceKn", 200),
} as const satisfies Record<string, FieldDef>;

export type FieldId = keyof typeof FIELDS;
export const FIELD_IDS = Object.keys(FIELDS) as FieldId[];


export interface Choices {
  pumpKind: "single" | "two-stage";
  endFixity: EndFixity;
  plateGrade: SteelGrade;
  plateSection: SectionMode;
  bolsterGrade: SteelGrade;
  bolsterSection: SectionMode;
  columnsGrade: SteelGrade;
  platenGrade: SteelGrade;
  throatGrade: SteelGrade;
}

export interface FormState {
  /** The system `values` are written in. */
  system: UnitSystem;
  values: Record<FieldId, string>;
  choices: Choices;
  blocks: Record<BlockId, boolean>;
  /** Nothing typed or switched yet: a first unit change may bring that system's own defaults. */
  pristine: boolean;
  /** What was typed before the last unit switch, to give it back unchanged on switching back. */
  beforeSwitch?: { system: UnitSystem; typed: Record<FieldId, string>; converted: Record<FieldId, string> };
}

const KIND_PERCENT_FACTOR = 100;

/** SI value → text in `system`. */
export function toText(field: FieldDef, si: number | "", system: UnitSystem): string {
  if (si === "") return "";
  if (field.kind === "count") return String(si);
  if (field.kind === "percent") return String(Number((si * KIND_PERCENT_FACTOR).toPrecision(6)));
  return formatInputValue(field.kind, si, system);
}

/** Text in `system` → SI; undefined when blank, NaN when it is not a number. */
export function fromText(field: FieldDef, text: string, system: UnitSystem): number | undefined {
  if (text.trim() === "") return undefined;
  const value =
    field.kind === "count" || field.kind === "percent" ? parseNumberInput(text) : parseDisplayInput(field.kind, text, system);
  if (value === null) return Number.NaN;
  return field.kind === "percent" ? value / KIND_PERCENT_FACTOR : value;
}

export function defaultForm(system: UnitSystem): FormState {
  const values = {} as Record<FieldId, string>;
  for (const id of FIELD_IDS) {
    const own = system === "imperial" ? IMPERIAL_DEFAULTS[id] : undefined;
    values[id] = own !== undefined ? String(own) : toText(FIELDS[id], FIELDS[id].initial, system);
  }
  const grade: SteelGrade = system === "imperial" ? "A36" : "S355JR";
  return {
    system,
    pristine: true,
    values,
    choices: {
      pumpKind: "two-stage",
      endFixity: "fixed-pinned",
      plateGrade: grade,
      plateSection: "solid",
      bolsterGrade: grade,
      bolsterSection: "solid",
      columnsGrade: grade,
      platenGrade: grade,
      throatGrade: grade,
    },
    // The frame starts half filled in, so a new design reads "incomplete" until it is checked.
    blocks: { lines: true, buckling: true, ratings: true, reservoir: true, plate: true, bolster: false, columns: false, platen: false, throat: false, die: false },
  };
}

/**
 * Rewrites every typed quantity in the other system; text that is not a number stays as typed.
 * Switching straight back restores what was typed (300 mm stays 300, not 299.999) for every
 * field left untouched in between.
 */
export function convertForm(form: FormState, to: UnitSystem): FormState {
  if (form.system === to) return form;
  const memo = form.beforeSwitch?.system === to ? form.beforeSwitch : undefined;
  const values = { ...form.values };
  for (const id of FIELD_IDS) {
    if (memo && memo.converted[id] === form.values[id]) {
      values[id] = memo.typed[id];
      continue;
    }
    const si = fromText(FIELDS[id], form.values[id], form.system);
    if (si !== undefined && Number.isFinite(si)) values[id] = toText(FIELDS[id], si, to);
  }
  return { ...form, system: to, pristine: false, values, beforeSwitch: { system: form.system, typed: form.values, converted: values } };
}

/** Sets fields from SI values (e.g. a bore chosen in the inverse mode). */
export function applySi(form: FormState, si: Partial<Record<FieldId, number>>): FormState {
  const values = { ...form.values };
  for (const [id, value] of Object.entries(si) as [FieldId, number][]) values[id] = toText(FIELDS[id], value, form.system);
  return { ...form, pristine: false, values };
}

/**
 * The SI object handed to the schema. Blank optional fields become undefined; blank required
 * ones too, so the schema reports them as required. Unchecked blocks are left out.
 */
export function rawInput(form: FormState): Record<string, unknown> {
  const n = (id: FieldId): number | undefined => fromText(FIELDS[id], form.values[id], form.system);
  const { choices: c, blocks: b } = form;
  const raw: Record<string, unknown> = {
    cylinders: { count: n("count"), boreMm: n("boreMm"), rodMm: n("rodMm"), strokeMm: n("strokeMm") },
    pump:
      c.pumpKind === "single"
        ? { kind: "single", flowLpm: n("flowLpm") }
        : { kind: "two-stage", approachFlowLpm: n("approachFlowLpm"), pressingFlowLpm: n("pressingFlowLpm"), unloadBar: n("unloadBar") },
    overallEfficiency: n("efficiencyPct"),
    pressureBar: n("pressureBar"),
    reliefBar: n("reliefBar"),
    motorKw: n("motorKw"),
    pressDistanceMm: n("pressDistanceMm"),
  };
  if (b.lines) raw.lines = { suctionIdMm: n("suctionIdMm"), pressureIdMm: n("pressureIdMm"), returnIdMm: n("returnIdMm") };
  if (b.buckling) raw.buckling = { endFixity: c.endFixity, exposedRodMm: n("exposedRodMm"), rodYieldMpa: n("rodYieldMpa") };
  if (b.ratings) {
    raw.ratings = { hoseBar: n("hoseBar"), valveBar: n("valveBar"), pumpBar: n("pumpBar"), cylinderBar: n("cylinderBar"), gaugeBar: n("gaugeBar") };
  }
  if (b.reservoir) raw.reservoir = { volumeL: n("volumeL"), usableL: n("usableL") };
  const plateOf = (role: "crosshead" | "bolster", key: "plate" | "bolster"): Record<string, unknown> => {
    const id = (suffix: string) => `${key}${suffix}` as FieldId;
    const section =
      c[`${key}Section`] === "solid"
        ? { widthMm: n(id("WidthMm")) }
        : { sectionModulusMm3: n(id("ModulusMm3")), inertiaMm4: n(id("InertiaMm4")) };
    return { role, spanMm: n(id("SpanMm")), thicknessMm: n(id("ThicknessMm")), grade: c[`${key}Grade`], ...section };
  };
  if (b.plate) raw.plate = plateOf("crosshead", "plate");
  if (b.bolster) raw.plates = [plateOf("bolster", "bolster")];
  if (b.columns) raw.columns = { count: n("columnsCount"), diameterMm: n("columnsDiameterMm"), grade: c.columnsGrade };
  if (b.platen) {
    raw.platen = {
      rodSpacingMm: n("platenRodSpacingMm"),
      dieWidthMm: n("platenDieWidthMm"),
      widthMm: n("platenWidthMm"),
      thicknessMm: n("platenThicknessMm"),
      grade: c.platenGrade,
    };
  }
  if (b.throat) {
    raw.throat = {
      depthMm: n("throatDepthMm"),
      heightMm: n("throatHeightMm"),
      sectionDepthMm: n("throatSectionDepthMm"),
      thicknessMm: n("throatThicknessMm"),
      grade: c.throatGrade,
    };
  }
  // The page checks one die, under a fixed name; the API and press records take several.
  if (b.die) raw.dies = [{ name: DIE_NAME, maxForceKn: n("dieMaxForceKn") }];
  return raw;
}

export const DIE_NAME = "Your die";

/** Which field a schema path belongs to. */
export const FIELD_BY_PATH: ReadonlyMap<string, FieldId> = new Map(FIELD_IDS.map((id) => [FIELDS[id].path, id]));
