/**
 * The sizing input as the API, the sizing page and the planned-press action accept it: SI units,
 * strict objects (an unknown key is an error, so a misspelt optional field is never silently
 * ignored), finite numbers inside the engine's sanity limits, and one message per field.
 * The engine re-checks the same rules (findInputProblems) for callers that bypass this schema.
 *
 * Written with zod/mini because the calculator validates in the browser: mini tree-shakes to a
 * few kB where classic zod costs about 30 kB of the page's first load. Every message is our own.
 */
import * as z from "zod/mini";
import "./browser-jitless";
import { INPUT_LIMITS, type InputProblem } from "@/lib/hydraulics";
import type { PlateInput, PlatenInput, SizingInput, ThroatInput } from "@/lib/hydraulics/types";
import { MIN_BORE_MINUS_ROD_MM } from "@/lib/hydraulics/validate";
import { fieldErrorsOf } from "./field-errors";

const L = INPUT_LIMITS;
type Limit = readonly [number, number];

/** A finite number within `limit`; messages name the field and its SI unit. */
function num(label: string, [min, max]: Limit, unit = "", integer = false) {
  const range = `${label} must be from ${min} to ${max}${unit ? ` ${unit}` : ""}.`;
  const checks = [z.minimum(min, range), z.maximum(max, range)];
  return z
    .number({
      error: (issue) => (issue.input === undefined ? `${label} is required.` : `${label} must be a number${unit ? ` (${unit})` : ""}.`),
    })
    .check(...(integer ? [z.int({ error: `${label} must be a whole number.` }), ...checks] : checks));
}

const opt = <T extends z.core.SomeType>(schema: T) => z.optional(schema);

function oneOf<const T extends readonly [string, ...string[]]>(label: string, values: T) {
  return z.enum(values, { error: `${label} must be one of: ${values.join(", ")}.` });
}

/**
 * Runs a cross-field rule only when each compared field (dotted path from the checked object) is
 * a number that passed its own checks — so a missing bore gives one message, not two.
 */
function whenClean(...paths: string[]) {
  return (payload: z.core.ParsePayload): boolean =>
    paths.every((path) => {
      let value: unknown = payload.value;
      for (const key of path.split(".")) value = typeof value === "object" && value !== null ? (value as Record<string, unknown>)[key] : undefined;
      return typeof value === "number" && !payload.issues.some((issue) => (issue.path ?? []).join(".") === path);
    });
}

/** Error of a nested object that is missing or not an object. */
function objectError(label: string, fields: string) {
  return {
    error: (issue: { input?: unknown }) =>
      issue.input === undefined ? `${label} is required: { ${fields} }.` : `${label} must be an object: { ${fields} }.`,
  };
}

export const STEEL_GRADES = ["S235JR", "S355JR", "A36"] as const;
export const END_FIXITIES = ["fixed-fixed", "fixed-pinned", "pinned-pinned", "fixed-free"] as const;

const cylinders = z
  .strictObject(
    {
      count: num("Cylinder count", L.cylinderCount, "", true),
      boreMm: num("Bore", L.diameterMm, "mm"),
      rodMm: num("Rod diameter", L.diameterMm, "mm"),
      strokeMm: num("Stroke", L.strokeMm, "mm"),
    },
    objectError("cylinders", "count, boreMm, rodMm, strokeMm"),
  )
  .check(
    z.refine((c) => c.boreMm - c.rodMm >= MIN_BORE_MINUS_ROD_MM, {
      message: `The rod must be smaller than the bore (by at least ${MIN_BORE_MINUS_ROD_MM} mm).`,
      path: ["rodMm"],
      when: whenClean("boreMm", "rodMm"),
    }),
  );

const pump = z.discriminatedUnion(
  "kind",
  [
    z.strictObject({ kind: z.literal("single"), flowLpm: num("Pump flow", L.flowLpm, "L/min") }),
    z
      .strictObject({
        kind: z.literal("two-stage"),
        approachFlowLpm: num("Approach (total) flow", L.flowLpm, "L/min"),
        pressingFlowLpm: num("Pressing flow", L.flowLpm, "L/min"),
        unloadBar: num("Unloading pressure", L.pressureBar, "bar"),
      })
      // The approach flow is both sections together, so it can never be less than the small one.
      .check(
        z.refine((p) => p.pressingFlowLpm <= p.approachFlowLpm, {
          message: "Pressing flow (the small section) must not exceed the approach (total) flow.",
          path: ["pressingFlowLpm"],
          when: whenClean("approachFlowLpm", "pressingFlowLpm"),
        }),
      ),
  ],
  {
    error: (issue) =>
      issue.input === undefined
        ? 'pump is required: { kind: "single", flowLpm } or { kind: "two-stage", approachFlowLpm, pressingFlowLpm, unloadBar }.'
        : 'Pump kind must be "single" or "two-stage".',
  },
);

const lines = z.strictObject(
  {
    suctionIdMm: opt(num("Suction line inside diameter", L.lineIdMm, "mm")),
    pressureIdMm: opt(num("Pressure line inside diameter", L.lineIdMm, "mm")),
    returnIdMm: opt(num("Return line inside diameter", L.lineIdMm, "mm")),
  },
  objectError("lines", "suctionIdMm?, pressureIdMm?, returnIdMm?"),
);

const buckling = z.strictObject(
  {
    endFixity: oneOf("Rod end fixity", END_FIXITIES),
    exposedRodMm: num("Exposed rod length", L.exposedRodMm, "mm"),
    rodYieldMpa: opt(num("Rod yield strength", L.yieldMpa, "MPa")),
  },
  objectError("buckling", "endFixity, exposedRodMm, rodYieldMpa?"),
);

const ratings = z.strictObject(
  {
    hoseBar: opt(num("Hose assembly rating", L.ratingBar, "bar")),
    valveBar: opt(num("Valve rating", L.ratingBar, "bar")),
    pumpBar: opt(num("Pump rating", L.ratingBar, "bar")),
    cylinderBar: opt(num("Cylinder rating", L.ratingBar, "bar")),
    gaugeBar: opt(num("Gauge full scale", L.ratingBar, "bar")),
  },
  objectError("ratings", "hoseBar?, valveBar?, pumpBar?, cylinderBar?, gaugeBar?"),
);

const PLATE_SECTION_MESSAGE = "Give either the plate width, or both the section modulus and the moment of inertia.";

/** A solid width, or a built-up section's modulus and inertia: exactly one of the two. */
function sectionRule(message: string) {
  return z.superRefine((p: { widthMm?: number; sectionModulusMm3?: number; inertiaMm4?: number }, ctx) => {
    const section = p.sectionModulusMm3 !== undefined || p.inertiaMm4 !== undefined;
    const complain = (field: string): void => ctx.addIssue({ code: "custom", message, path: [field], input: p });
    if (p.widthMm !== undefined && section) complain("widthMm");
    if (p.widthMm === undefined && p.sectionModulusMm3 === undefined) complain("widthMm");
    if (p.widthMm === undefined && section && p.inertiaMm4 === undefined) complain("inertiaMm4");
  });
}

/** Width of a solid plate, or the modulus and inertia of a built-up section. */
function sectionFields(what: string) {
  return {
    widthMm: opt(num(`${what} width`, L.plateMm, "mm")),
    sectionModulusMm3: opt(num("Section modulus", L.sectionModulusMm3, "mm³")),
    inertiaMm4: opt(num("Moment of inertia", L.inertiaMm4, "mm⁴")),
  };
}

const plateFields = z
  .strictObject(
    {
      role: oneOf("Plate role", ["crosshead", "bolster"] as const),
      spanMm: num("Plate span", L.plateMm, "mm"),
      thicknessMm: num("Plate thickness", L.plateMm, "mm"),
      grade: oneOf("Steel grade", STEEL_GRADES),
      ...sectionFields("Plate"),
    },
    objectError("plate", "role, spanMm, thicknessMm, grade, widthMm | sectionModulusMm3 + inertiaMm4"),
  )
  .check(sectionRule(PLATE_SECTION_MESSAGE));

/** The checked fields as the engine's solid-or-built-up union (the rule above guarantees one). */
function withSection<T extends { widthMm?: number; sectionModulusMm3?: number; inertiaMm4?: number }>(p: T) {
  const { widthMm, sectionModulusMm3, inertiaMm4, ...base } = p;
  if (widthMm !== undefined) return { ...base, widthMm };
  return { ...base, sectionModulusMm3: sectionModulusMm3 ?? Number.NaN, inertiaMm4: inertiaMm4 ?? Number.NaN };
}

const plate = z.pipe(
  plateFields,
  z.transform((p): PlateInput => withSection(p)),
);

const PLATEN_SECTION_MESSAGE = "Give either the platen width, or both the section modulus and the moment of inertia.";
const platen = z.pipe(
  z
    .strictObject(
      {
        rodSpacingMm: num("Rod spacing", L.plateMm, "mm"),
        dieWidthMm: num("Die width", L.plateMm, "mm"),
        thicknessMm: num("Platen thickness", L.plateMm, "mm"),
        grade: oneOf("Platen steel grade", STEEL_GRADES),
        ...sectionFields("Platen"),
      },
      objectError("platen", "rodSpacingMm, dieWidthMm, thicknessMm, grade, widthMm | sectionModulusMm3 + inertiaMm4"),
    )
    .check(sectionRule(PLATEN_SECTION_MESSAGE)),
  z.transform((p): PlatenInput => withSection(p)),
);

const THROAT_SECTION_MESSAGE = "Give either the section depth (solid), or the area, section modulus and moment of inertia (built-up).";
const throat = z.pipe(
  z
    .strictObject(
      {
        depthMm: num("Throat depth", L.plateMm, "mm"),
        heightMm: num("Throat height", L.plateMm, "mm"),
        thicknessMm: num("Throat thickness", L.plateMm, "mm"),
        grade: oneOf("Throat steel grade", STEEL_GRADES),
        sectionDepthMm: opt(num("Throat section depth", L.plateMm, "mm")),
        areaMm2: opt(num("Throat section area", L.areaMm2, "mm²")),
        sectionModulusMm3: opt(num("Section modulus", L.sectionModulusMm3, "mm³")),
        inertiaMm4: opt(num("Moment of inertia", L.inertiaMm4, "mm⁴")),
      },
      objectError("throat", "depthMm, heightMm, thicknessMm, grade, sectionDepthMm | areaMm2 + sectionModulusMm3 + inertiaMm4"),
    )
    .check(
      z.superRefine((t, ctx) => {
        const builtUp = [t.areaMm2, t.sectionModulusMm3, t.inertiaMm4];
        const complain = (field: string): void => ctx.addIssue({ code: "custom", message: THROAT_SECTION_MESSAGE, path: [field], input: t });
        if (t.sectionDepthMm !== undefined && builtUp.some((v) => v !== undefined)) complain("sectionDepthMm");
        if (t.sectionDepthMm === undefined) {
          (["areaMm2", "sectionModulusMm3", "inertiaMm4"] as const).forEach((key) => t[key] === undefined && complain(key));
        }
      }),
    ),
  z.transform((t): ThroatInput => {
    const base = { depthMm: t.depthMm, heightMm: t.heightMm, thicknessMm: t.thicknessMm, grade: t.grade };
    if (t.sectionDepthMm !== undefined) return { ...base, sectionDepthMm: t.sectionDepthMm };
    return { ...base, areaMm2: t.areaMm2 ?? Number.NaN, sectionModulusMm3: t.sectionModulusMm3 ?? Number.NaN, inertiaMm4: t.inertiaMm4 ?? Number.NaN };
  }),
);

const die = z.strictObject(
  {
    name: z.string({ error: "Die name is required." }).check(
      z.trim(),
      z.minLength(L.dieNameLength[0], { error: "Die name is required." }),
      z.maxLength(L.dieNameLength[1], { error: `Die name must be at most ${L.dieNameLength[1]} characters.` }),
    ),
    maxForceKn: num("Die force limit", L.forceKn, "kN"),
  },
  objectError("die", "name, maxForceKn"),
);

const plates = z
  .array(plate, { error: "plates must be a list of plates." })
  .check(
    z.maxLength(2, { error: "plates lists at most two plates: a crosshead and a bolster." }),
    z.refine((list) => new Set(list.map((p) => p.role)).size === list.length, { message: "Each plate role may appear once.", path: [] }),
  );

const columns = z.strictObject(
  {
    count: num("Column count", L.columnCount, "", true),
    diameterMm: num("Column diameter", L.diameterMm, "mm"),
    grade: oneOf("Column steel grade", STEEL_GRADES),
  },
  objectError("columns", "count, diameterMm, grade"),
);

const sizingObject = z
  .strictObject(
    {
      cylinders,
      pump,
      overallEfficiency: opt(num("Overall efficiency", L.efficiency, "(fraction, 0.85 = 85 %)")),
      pressureBar: num("Working pressure", L.pressureBar, "bar"),
      reliefBar: opt(num("Relief setting", L.pressureBar, "bar")),
      motorKw: opt(num("Motor power", L.motorKw, "kW")),
      pressDistanceMm: opt(num("Pressing distance", [0, L.strokeMm[1]], "mm")),
      lines: opt(lines),
      buckling: opt(buckling),
      ratings: opt(ratings),
      reservoir: opt(
        z
          .strictObject(
            { volumeL: num("Reservoir volume", L.volumeL, "L"), usableL: opt(num("Usable volume above the pickup", L.volumeL, "L")) },
            objectError("reservoir", "volumeL, usableL?"),
          )
          .check(
            z.refine((r) => r.usableL === undefined || r.usableL <= r.volumeL, {
              message: "Usable volume above the pickup cannot exceed the tank volume.",
              path: ["usableL"],
              when: whenClean("volumeL", "usableL"),
            }),
          ),
      ),
      plate: opt(plate),
      plates: opt(plates),
      columns: opt(columns),
      platen: opt(platen),
      throat: opt(throat),
      dies: opt(z.array(die, { error: "dies must be a list." }).check(z.maxLength(L.dieCount[1], { error: `List at most ${L.dieCount[1]} dies.` }))),
    },
    { error: "Send a JSON object with the sizing input." },
  )
  .check(
    z.refine((s) => !(s.plate && s.plates?.some((p) => p.role === s.plate?.role)), {
      message: "This plate role is already given in plate; give each role once.",
      path: ["plates"],
    }),
    z.refine((s) => s.pressDistanceMm === undefined || s.pressDistanceMm <= s.cylinders.strokeMm, {
      message: "Pressing distance must not exceed the stroke.",
      path: ["pressDistanceMm"],
      when: whenClean("pressDistanceMm", "cylinders.strokeMm"),
    }),
  );

/** The whole sizing input (SI). Parsed data is the engine's SizingInput. */
export const sizingInputSchema: z.ZodMiniType<SizingInput> = sizingObject;

/** Messages keyed by dotted field path ("cylinders.boreMm"); "body" for the request as a whole. */
export type SizingFieldErrors = Record<string, string[]>;
export const BODY_KEY = "body";

/** One entry per field, unknown keys each under their own path (see lib/validation/field-errors). */
export function sizingFieldErrors(error: z.core.$ZodError): SizingFieldErrors {
  return fieldErrorsOf(error.issues, BODY_KEY);
}

/** The engine's own refusals (SizingInputError) in the same shape. */
export function problemFieldErrors(problems: readonly InputProblem[]): SizingFieldErrors {
  return fieldErrorsOf(
    problems.map((p) => ({ path: p.path ? p.path.split(".") : [], message: `${p.path} ${p.message}.` })),
    BODY_KEY,
  );
}
