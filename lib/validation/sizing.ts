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
import { INPUT_LIMITS, type InputProblem } from "@/lib/hydraulics";
import type { PlateInput, SizingInput } from "@/lib/hydraulics/types";
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

const plateFields = z
  .strictObject(
    {
      role: oneOf("Plate role", ["crosshead", "bolster"] as const),
      spanMm: num("Plate span", L.plateMm, "mm"),
      thicknessMm: num("Plate thickness", L.plateMm, "mm"),
      grade: oneOf("Steel grade", STEEL_GRADES),
      widthMm: opt(num("Plate width", L.plateMm, "mm")),
      sectionModulusMm3: opt(num("Section modulus", L.sectionModulusMm3, "mm³")),
      inertiaMm4: opt(num("Moment of inertia", L.inertiaMm4, "mm⁴")),
    },
    objectError("plate", "role, spanMm, thicknessMm, grade, widthMm | sectionModulusMm3 + inertiaMm4"),
  )
  .check(
    z.superRefine((p, ctx) => {
      const section = p.sectionModulusMm3 !== undefined || p.inertiaMm4 !== undefined;
      const complain = (field: string): void => ctx.addIssue({ code: "custom", message: PLATE_SECTION_MESSAGE, path: [field], input: p });
      if (p.widthMm !== undefined && section) complain("widthMm");
      if (p.widthMm === undefined && p.sectionModulusMm3 === undefined) complain("widthMm");
      if (p.widthMm === undefined && section && p.inertiaMm4 === undefined) complain("inertiaMm4");
    }),
  );

const plate = z.pipe(
  plateFields,
  z.transform((p): PlateInput => {
    const base = { role: p.role, spanMm: p.spanMm, thicknessMm: p.thicknessMm, grade: p.grade };
    if (p.widthMm !== undefined) return { ...base, widthMm: p.widthMm };
    // The check above guarantees both section figures here.
    return { ...base, sectionModulusMm3: p.sectionModulusMm3 ?? Number.NaN, inertiaMm4: p.inertiaMm4 ?? Number.NaN };
  }),
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
      reservoir: opt(z.strictObject({ volumeL: num("Reservoir volume", L.volumeL, "L") }, objectError("reservoir", "volumeL"))),
      plate: opt(plate),
      columns: opt(columns),
    },
    { error: "Send a JSON object with the sizing input." },
  )
  .check(
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
