import { z } from "zod";
import { FRAME_TYPES, LIFECYCLES } from "@/db/schema/presses";
import { COMPONENT_KINDS } from "@/db/schema/components";
import { SPEC_SCHEMAS } from "./component-spec";

const optionalPositive = (label: string, max: number) =>
  z
    .number({ error: `${label} must be a number.` })
    .positive(`${label} must be more than zero.`)
    .max(max, `${label} looks far too large.`)
    .nullable()
    .optional();

/**
 * A press's fields (SI), with no defaults: a default here would survive `.partial()` and make a
 * PATCH that never mentioned a field reset it. Defaults belong to the create schema only.
 */
const pressFields = z.strictObject({
  name: z.string().trim().min(1, "Give the press a name.").max(100, "Use at most 100 characters."),
  frameType: z.enum(FRAME_TYPES, { error: "Choose a frame type." }),
  lifecycle: z.enum(LIFECYCLES, { error: `Lifecycle must be one of: ${LIFECYCLES.join(", ")}.` }),
  ratedForceKn: optionalPositive("Rated force", 50_000),
  daylightMm: optionalPositive("Daylight", 10_000),
  strokeMm: optionalPositive("Stroke", 10_000),
  bedWidthMm: optionalPositive("Bed width", 10_000),
  bedDepthMm: optionalPositive("Bed depth", 10_000),
  workingPressureBar: optionalPositive("Working pressure", 1_000),
  reliefPressureBar: optionalPositive("Relief pressure", 1_000),
  location: z.string().trim().max(100).nullable().optional(),
  notes: z.string().trim().max(4000).nullable().optional(),
});

/** A new press. Everything but the name and frame type may be filled in later; it starts planned. */
export const pressInputSchema = pressFields.extend({ lifecycle: pressFields.shape.lifecycle.default("planned") });
export type PressInput = z.input<typeof pressInputSchema>;

/** A PATCH: only the fields it carries (see pressFields). */
export const pressPatchSchema = pressFields.partial();
export type PressPatch = z.infer<typeof pressPatchSchema>;

const isoDate = z.iso.date("Use a date like 2026-03-14.");

/** A component as entered: common fields plus the kind's spec, checked against that kind's schema. */
export const componentInputSchema = z
  .strictObject({
    kind: z.enum(COMPONENT_KINDS),
    label: z.string().trim().min(1, "Give the part a name, e.g. “Main cylinder”.").max(100),
    spec: z.record(z.string(), z.unknown()),
    maker: z.string().trim().max(100).nullable().optional(),
    partNumber: z.string().trim().max(100).nullable().optional(),
    supplier: z.string().trim().max(100).nullable().optional(),
    costCents: z.number().int("Cost must be whole cents.").min(0, "Cost cannot be negative.").max(100_000_000).nullable().optional(),
    purchased: z.boolean().optional(),
    installedOn: isoDate.nullable().optional(),
  })
  .transform((value, ctx) => {
    const parsed = SPEC_SCHEMAS[value.kind].safeParse({ ...value.spec, kind: value.kind });
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        // Unknown keys are named one by one, as everywhere else (lib/validation/field-errors.ts).
        const keys = issue.code === "unrecognized_keys" ? issue.keys : [];
        for (const key of keys) ctx.addIssue({ code: "custom", message: `Unknown field "${key}".`, path: ["spec", ...issue.path, key] });
        if (keys.length === 0) ctx.addIssue({ code: "custom", message: issue.message, path: ["spec", ...issue.path] });
      }
      return z.NEVER;
    }
    return { ...value, spec: parsed.data };
  });
export type ComponentInput = z.output<typeof componentInputSchema>;

export const componentPatchSchema = z.strictObject({
  label: z.string().trim().min(1).max(100).optional(),
  spec: z.record(z.string(), z.unknown()).optional(),
  maker: z.string().trim().max(100).nullable().optional(),
  partNumber: z.string().trim().max(100).nullable().optional(),
  supplier: z.string().trim().max(100).nullable().optional(),
  costCents: z.number().int().min(0).max(100_000_000).nullable().optional(),
  purchased: z.boolean().optional(),
  installedOn: isoDate.nullable().optional(),
});
export type ComponentPatch = z.infer<typeof componentPatchSchema>;

export const replaceComponentSchema = z.strictObject({
  reason: z.string().trim().min(1, "Say why the part was replaced.").max(255),
  removedOn: isoDate,
  replacement: z.record(z.string(), z.unknown()),
});

const meterHours = z.number({ error: "Enter the hour-meter reading." }).min(0, "Hours cannot be negative.").max(1_000_000, "That is more hours than any meter shows.");

export const hourReadingSchema = z.strictObject({
  hours: meterHours,
  note: z.string().trim().max(255).nullable().optional(),
});

/** A manager's correction of a wrong reading: the right value and why. */
export const hourCorrectionSchema = z.strictObject({
  hours: meterHours,
  reason: z.string({ error: "Say why the reading is corrected." }).trim().min(1, "Say why the reading is corrected.").max(255, "Use at most 255 characters."),
});
