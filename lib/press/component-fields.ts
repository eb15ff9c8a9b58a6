import type { QuantityKind } from "@/lib/units";
import type { ComponentKind } from "@/lib/validation/component-spec";
import { END_FIXITIES, FRAME_MEMBER_ROLES, LINES, MOTOR_SUPPLIES, STEEL_GRADES } from "@/lib/validation/component-spec";

/**
 * How each kind's spec is entered: one definition drives the form, the conversion of typed
 * values from the user's units to SI, and the spec summary shown in lists.
 */
export type SpecField =
  | { name: string; label: string; type: "quantity"; quantity: QuantityKind; required: boolean }
  | { name: string; label: string; type: "number"; unit: string; required: boolean }
  | { name: string; label: string; type: "select"; options: readonly string[]; required: boolean }
  | { name: string; label: string; type: "text" | "date"; required: boolean };

const q = (name: string, label: string, quantity: QuantityKind, required = true): SpecField => ({ name, label, type: "quantity", quantity, required });
const sel = (name: string, label: string, options: readonly string[]): SpecField => ({ name, label, type: "select", options, required: true });
const text = (name: string, label: string, required = false): SpecField => ({ name, label, type: "text", required });

const plateFields = [q("spanMm", "Span between supports", "length"), q("widthMm", "Width", "length"), q("thicknessMm", "Thickness", "length"), sel("grade", "Steel grade", STEEL_GRADES)];

export const KIND_LABELS: Record<ComponentKind, string> = {
  "frame-member": "Frame member",
  crosshead: "Crosshead",
  bolster: "Bolster plate",
  platen: "Platen (moving plate)",
  cylinder: "Cylinder",
  pump: "Pump",
  motor: "Motor",
  "directional-valve": "Directional valve",
  "relief-valve": "Relief valve",
  hose: "Hose",
  filter: "Filter",
  reservoir: "Reservoir",
  gauge: "Gauge",
  die: "Die",
};

export const SPEC_FIELDS: Record<ComponentKind, SpecField[]> = {
  "frame-member": [sel("role", "Role", FRAME_MEMBER_ROLES), q("lengthMm", "Length", "length", false), q("diameterMm", "Diameter (root diameter for a thread)", "length", false), q("widthMm", "Width (throat: the back's section depth)", "length", false), q("thicknessMm", "Thickness", "length", false), q("throatDepthMm", "Throat depth, ram axis to the back's centre (open frames)", "length", false), sel("grade", "Steel grade", STEEL_GRADES)],
  crosshead: plateFields,
  bolster: plateFields,
  platen: [q("rodSpacingMm", "Rod spacing (centre to centre)", "length"), q("dieWidthMm", "Die width", "length"), q("widthMm", "Width", "length"), q("thicknessMm", "Thickness", "length"), sel("grade", "Steel grade", STEEL_GRADES)],
  cylinder: [q("boreMm", "Bore", "length"), q("rodMm", "Rod", "length"), q("strokeMm", "Stroke", "length"), q("ratedPressureBar", "Rated pressure", "pressure"), sel("endFixity", "Rod end fixity", END_FIXITIES), q("exposedRodMm", "Exposed rod at full retraction", "length", false)],
  pump: [sel("pumpKind", "Pump type", ["single", "two-stage"]), q("flowLpm", "Flow (single-stage)", "flow", false), q("approachFlowLpm", "Total flow below unloading (two-stage)", "flow", false), q("pressingFlowLpm", "Pressing flow, small section (two-stage)", "flow", false), q("unloadBar", "Unloading pressure (two-stage)", "pressure", false), q("ratedPressureBar", "Rated pressure", "pressure")],
  motor: [q("powerKw", "Power", "power"), { name: "speedRpm", label: "Speed", type: "number", unit: "rpm", required: false }, sel("supply", "Supply", MOTOR_SUPPLIES)],
  "directional-valve": [q("ratedFlowLpm", "Rated flow", "flow"), q("ratedPressureBar", "Rated pressure", "pressure")],
  "relief-valve": [q("settingBar", "Setting", "pressure"), q("ratedPressureBar", "Rated pressure", "pressure", false)],
  hose: [sel("line", "Line (pressure = any hose that can see pump pressure)", LINES), q("insideDiameterMm", "Inside diameter", "length"), text("standard", "Standard and type (from the layline)", true), q("ratedPressureBar", "Rated working pressure (from the layline)", "pressure"), q("lengthMm", "Length", "length"), { name: "assembledOn", label: "Assembly date", type: "date", required: false }],
  filter: [sel("location", "Location", LINES), { name: "ratingMicron", label: "Rating", type: "number", unit: "µm", required: true }, text("elementPart", "Element part number")],
  reservoir: [q("volumeL", "Volume", "volume"), text("oilGrade", "Oil grade (e.g. ISO VG 46)")],
  gauge: [q("rangeBar", "Full-scale range", "pressure")],
  die: [text("purpose", "Purpose", true), q("widthMm", "Width", "length", false), q("lengthMm", "Length", "length", false), q("maxForceKn", "Force limit (maker's or own calculation)", "force", false)],
};
