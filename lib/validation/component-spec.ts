import { z } from "zod";

/**
 * Kind-specific figures of a press component, stored in SI (mm, bar, L/min, kW, L, µm).
 * One discriminated union: the API, the forms and the as-built check all read this shape.
 * Upper bounds are generous sanity limits for home-built presses, not engineering limits.
 */
const positive = (label: string, max: number) =>
  z
    .number({ error: `${label} must be a number.` })
    .refine(Number.isFinite, `${label} must be a number.`)
    .positive(`${label} must be more than zero.`)
    .max(max, `${label} looks far too large (at most ${max}).`);

export const STEEL_GRADES = ["S235JR", "S355JR", "A36"] as const;
export const END_FIXITIES = ["fixed-fixed", "fixed-pinned", "pinned-pinned", "fixed-free"] as const;
export const FRAME_MEMBER_ROLES = ["column", "tie-rod", "side-plate", "beam", "throat", "other"] as const;
export const LINES = ["pressure", "return", "suction"] as const;
export const MOTOR_SUPPLIES = ["single-phase", "three-phase", "engine", "other"] as const;

const grade = z.enum(STEEL_GRADES, { error: "Choose a steel grade." });

const plate = {
  spanMm: positive("Span", 5000),
  widthMm: positive("Width", 3000),
  thicknessMm: positive("Thickness", 500),
  grade,
};

export const frameMemberSpec = z.strictObject({
  kind: z.literal("frame-member"),
  role: z.enum(FRAME_MEMBER_ROLES),
  lengthMm: positive("Length", 10000).optional(),
  /** Round bar or threaded rod (for a thread: the root diameter). */
  diameterMm: positive("Diameter", 500).optional(),
  widthMm: positive("Width", 3000).optional(),
  thicknessMm: positive("Thickness", 500).optional(),
  /**
   * Throat of an open (C) frame: distance from the ram's axis to the back's centre line. With it,
   * `lengthMm` is the back's length between the jaws, `widthMm` the back's section depth and
   * `thicknessMm` its total plate thickness.
   */
  throatDepthMm: positive("Throat depth", 3000).optional(),
  grade,
});

export const crossheadSpec = z.strictObject({ kind: z.literal("crosshead"), ...plate });
export const bolsterSpec = z.strictObject({ kind: z.literal("bolster"), ...plate });

/** The moving plate between parallel rams: rods `rodSpacingMm` apart, the work over `dieWidthMm`. */
export const platenSpec = z.strictObject({
  kind: z.literal("platen"),
  rodSpacingMm: positive("Rod spacing", 5000),
  dieWidthMm: positive("Die width", 3000),
  widthMm: positive("Width", 3000),
  thicknessMm: positive("Thickness", 500),
  grade,
});

export const cylinderSpec = z
  .strictObject({
    kind: z.literal("cylinder"),
    boreMm: positive("Bore", 1000),
    rodMm: positive("Rod", 1000),
    strokeMm: positive("Stroke", 3000),
    ratedPressureBar: positive("Rated pressure", 1000),
    endFixity: z.enum(END_FIXITIES),
    exposedRodMm: z.number().min(0).max(3000).optional(),
  })
  .refine((c) => c.rodMm < c.boreMm, {
    message: "The rod must be smaller than the bore.",
    path: ["rodMm"],
    // Report it alongside other field errors, as long as both sizes are numbers.
    when: (payload) => {
      const v = payload.value as { boreMm?: unknown; rodMm?: unknown };
      return typeof v.boreMm === "number" && typeof v.rodMm === "number";
    },
  });

export const pumpSpec = z.discriminatedUnion("pumpKind", [
  z.strictObject({
    kind: z.literal("pump"),
    pumpKind: z.literal("single"),
    flowLpm: positive("Flow", 1000),
    ratedPressureBar: positive("Rated pressure", 1000),
  }),
  z
    .strictObject({
      kind: z.literal("pump"),
      pumpKind: z.literal("two-stage"),
      approachFlowLpm: positive("Total (approach) flow", 1000),
      pressingFlowLpm: positive("Pressing flow", 1000),
      unloadBar: positive("Unloading pressure", 1000),
      ratedPressureBar: positive("Rated pressure", 1000),
    })
    .refine((p) => p.pressingFlowLpm < p.approachFlowLpm, {
      message: "The pressing (small-section) flow must be less than the total flow.",
      path: ["pressingFlowLpm"],
    }),
]);

export const motorSpec = z.strictObject({
  kind: z.literal("motor"),
  powerKw: positive("Power", 500),
  speedRpm: positive("Speed", 10000).optional(),
  supply: z.enum(MOTOR_SUPPLIES),
});

export const directionalValveSpec = z.strictObject({
  kind: z.literal("directional-valve"),
  ratedFlowLpm: positive("Rated flow", 2000),
  ratedPressureBar: positive("Rated pressure", 1000),
});

export const reliefValveSpec = z.strictObject({
  kind: z.literal("relief-valve"),
  settingBar: positive("Setting", 1000),
  ratedPressureBar: positive("Rated pressure", 1000).optional(),
});

export const hoseSpec = z.strictObject({
  kind: z.literal("hose"),
  line: z.enum(LINES),
  insideDiameterMm: positive("Inside diameter", 200),
  /** Standard and type as printed on the layline, e.g. "SAE 100R2AT" or "EN 853 2SN". */
  standard: z.string().trim().min(1, "Give the standard and type from the layline.").max(60),
  /** Working pressure printed on the layline: it wins over any table. */
  ratedPressureBar: positive("Rated working pressure", 1500),
  lengthMm: positive("Length", 20000),
  assembledOn: z.iso.date("Use a date like 2026-03-14.").optional(),
});

export const filterSpec = z.strictObject({
  kind: z.literal("filter"),
  location: z.enum(LINES),
  ratingMicron: positive("Rating", 500),
  elementPart: z.string().trim().max(100).optional(),
});

export const reservoirSpec = z.strictObject({
  kind: z.literal("reservoir"),
  volumeL: positive("Volume", 5000),
  oilGrade: z.string().trim().max(40).optional(),
});

export const gaugeSpec = z.strictObject({
  kind: z.literal("gauge"),
  rangeBar: positive("Range", 2000),
});

export const dieSpec = z.strictObject({
  kind: z.literal("die"),
  purpose: z.string().trim().min(1, "Say what the die is for.").max(100),
  widthMm: positive("Width", 3000).optional(),
  lengthMm: positive("Length", 3000).optional(),
  /** The die's own force limit, from its maker or its own calculation (kN). */
  maxForceKn: positive("Force limit", 100000).optional(),
});

export const componentSpecSchema = z.union([
  frameMemberSpec,
  crossheadSpec,
  bolsterSpec,
  platenSpec,
  cylinderSpec,
  pumpSpec,
  motorSpec,
  directionalValveSpec,
  reliefValveSpec,
  hoseSpec,
  filterSpec,
  reservoirSpec,
  gaugeSpec,
  dieSpec,
]);

export type ComponentSpec = z.infer<typeof componentSpecSchema>;
export type ComponentKind = ComponentSpec["kind"];
export type SpecOf<K extends ComponentKind> = Extract<ComponentSpec, { kind: K }>;

/** The schema of one kind, for field-level messages (a union only reports "invalid input"). */
export const SPEC_SCHEMAS = {
  "frame-member": frameMemberSpec,
  crosshead: crossheadSpec,
  bolster: bolsterSpec,
  platen: platenSpec,
  cylinder: cylinderSpec,
  pump: pumpSpec,
  motor: motorSpec,
  "directional-valve": directionalValveSpec,
  "relief-valve": reliefValveSpec,
  hose: hoseSpec,
  filter: filterSpec,
  reservoir: reservoirSpec,
  gauge: gaugeSpec,
  die: dieSpec,
} as const satisfies Record<ComponentKind, z.ZodType>;
