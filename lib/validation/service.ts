import { z } from "zod";
import { SERVICE_KINDS } from "@/db/schema/service";
import { ID_PATTERN } from "@/lib/ids";
import { parseIso4406 } from "@/lib/service/iso4406";

const isoDate = z.iso.date("Use a date like 2026-03-14.");
const id = z.string().regex(ID_PATTERN, "Not a valid id.");
const pressure = (label: string) => z.number({ error: `${label} must be a number.` }).positive(`${label} must be more than zero.`).max(1_000, `${label} looks far too large.`);
const cents = z.number({ error: "Cost must be a number." }).int("Cost must be whole cents.").min(0, "Cost cannot be negative.").max(100_000_000);

export const servicePartSchema = z.strictObject({
  description: z.string().trim().min(1, "Describe the part.").max(200),
  quantity: z.number().positive().max(10_000).default(1),
  componentId: id.nullable().optional(),
});

/** Fields a correction may change; the kind, reading and linked parts are history and stay. */
const correctable = {
  performedOn: isoDate,
  parts: z.array(servicePartSchema).max(30, "At most 30 parts per entry.").default([]),
  costCents: cents.nullable().optional(),
  iso4406: z.string().trim().max(8).nullable().optional(),
  reliefFoundBar: pressure("Relief found at").nullable().optional(),
  reliefSetBar: pressure("Relief set to").nullable().optional(),
  notes: z.string().trim().max(4000).nullable().optional(),
};

type KindFields = { kind: (typeof SERVICE_KINDS)[number]; iso4406?: string | null; reliefFoundBar?: number | null; reliefSetBar?: number | null };

export type FieldProblem = { path: string; message: string };

/** Kind-specific rules, shared by new entries and corrections (which re-check against the stored kind). */
export function kindFieldProblems(value: KindFields): FieldProblem[] {
  const out: FieldProblem[] = [];
  if (value.kind === "oil-sample") {
    const parsed = value.iso4406 ? parseIso4406(value.iso4406) : { ok: false as const, message: "Give the sample's ISO 4406 code, e.g. 18/16/13." };
    if (!parsed.ok) out.push({ path: "iso4406", message: parsed.message });
  } else if (value.iso4406) out.push({ path: "iso4406", message: "An ISO 4406 code belongs to an oil sample." });
  if (value.kind !== "relief-checked") {
    for (const key of ["reliefFoundBar", "reliefSetBar"] as const) {
      if (value[key] != null) out.push({ path: key, message: "Relief settings belong to a relief valve check." });
    }
  } else if (value.reliefFoundBar == null && value.reliefSetBar == null) {
    out.push({ path: "reliefFoundBar", message: "Give the setting found, the setting left, or both." });
  }
  return out;
}

/** The same problems as a ZodError, so routes answer 400 naming the field. */
export function fieldError(problems: readonly FieldProblem[]): z.ZodError {
  return new z.ZodError(problems.map((p) => ({ code: "custom" as const, path: [p.path], message: p.message, input: undefined })));
}

/** A new service-log entry (SI; cost in cents). A hose replacement names the hose taken off. */
export const serviceEntryInputSchema = z
  .strictObject({
    kind: z.enum(SERVICE_KINDS, { error: "Choose what was done." }),
    hours: z.number({ error: "The hour-meter reading must be a number." }).min(0, "Hours cannot be negative.").max(1_000_000).nullable().optional(),
    componentId: id.nullable().optional(),
    /** Label for the new hose; it otherwise keeps the old one's label and spec (like for like). */
    replacementLabel: z.string().trim().min(1).max(100).nullable().optional(),
    ...correctable,
  })
  .superRefine((value, ctx) => {
    for (const p of kindFieldProblems(value)) ctx.addIssue({ code: "custom", path: [p.path], message: p.message });
    if (value.kind === "hose-replaced" && !value.componentId) ctx.addIssue({ code: "custom", path: ["componentId"], message: "Choose the hose that was replaced." });
    if (value.kind !== "hose-replaced" && value.replacementLabel) ctx.addIssue({ code: "custom", path: ["replacementLabel"], message: "Only a hose replacement installs a new part." });
  });
export type ServiceEntryInput = z.output<typeof serviceEntryInputSchema>;

/** A correction: any of the correctable fields; the kind rules are re-checked against the stored kind. */
export const serviceEntryPatchSchema = z.strictObject({
  performedOn: correctable.performedOn.optional(),
  parts: z.array(servicePartSchema).max(30).optional(),
  costCents: correctable.costCents,
  iso4406: correctable.iso4406,
  reliefFoundBar: correctable.reliefFoundBar,
  reliefSetBar: correctable.reliefSetBar,
  notes: correctable.notes,
});
export type ServiceEntryPatch = z.output<typeof serviceEntryPatchSchema>;

/** A recurring plan task: days and/or hours, at least one. */
export const serviceTaskInputSchema = z
  .strictObject({
    title: z.string().trim().min(1, "Name the task.").max(100),
    kind: z.enum(SERVICE_KINDS, { error: "Choose the log entry that completes it." }),
    intervalDays: z.number({ error: "Days must be a number." }).int("Use whole days.").positive("Days must be more than zero.").max(3_650).nullable().optional(),
    intervalHours: z.number({ error: "Hours must be a number." }).positive("Hours must be more than zero.").max(100_000).nullable().optional(),
  })
  .refine((v) => v.intervalDays != null || v.intervalHours != null, { path: ["intervalDays"], message: "Give an interval in days, in hours, or both." });
export type ServiceTaskInput = z.output<typeof serviceTaskInputSchema>;

const startingPlanSchema = z.strictObject({ startingPlan: z.literal(true) });

/** POST body of the plan API: `{ startingPlan: true }`, or one task (errors name the task's fields). */
export function parsePlanPost(body: unknown): { startingPlan: true } | ServiceTaskInput {
  const wantsStartingPlan = typeof body === "object" && body !== null && "startingPlan" in body;
  return wantsStartingPlan ? startingPlanSchema.parse(body) : serviceTaskInputSchema.parse(body);
}

export const serviceLogQuerySchema = z.strictObject({
  limit: z.coerce.number().int().min(1).max(100).default(50),
  cursor: z.string().max(80).optional(),
  kind: z.enum(SERVICE_KINDS).optional(),
});
