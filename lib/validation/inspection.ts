import { z } from "zod";
import { CADENCES, INSPECTION_AREAS, OUTCOMES } from "@/db/schema/inspections";
import { ID_PATTERN } from "@/lib/ids";

const recordId = (what: string) => z.string().regex(ID_PATTERN, `Not a valid ${what} id.`);
/** Text that becomes part of a signed record is stored in NFC, so the same words are the same bytes. */
const text = (max: number, message: string) =>
  z
    .string()
    .trim()
    .max(max, `Keep it to ${max} characters.`)
    .transform((s) => s.normalize("NFC"))
    .pipe(z.string().min(1, message));

export const MAX_NOTE_LENGTH = 1000;
export const ITEM_KEY_PATTERN = /^[a-z0-9-]{1,40}$/;

export const startInspectionSchema = z.strictObject({ templateId: recordId("checklist") });

/** One answer change from the run page; `opKey` makes it idempotent (a retried send lands once). */
export const answerChangeSchema = z
  .strictObject({
    opKey: z.string().regex(/^[A-Za-z0-9-]{8,64}$/, "Not a valid change key."),
    itemKey: z.string().regex(ITEM_KEY_PATTERN, "Not a checklist item."),
    outcome: z.enum(OUTCOMES, { error: "Answer pass, fail or not applicable." }).nullable(),
    note: z
      .string()
      .trim()
      .max(MAX_NOTE_LENGTH, `Keep the note to ${MAX_NOTE_LENGTH} characters.`)
      .transform((s) => s.normalize("NFC") || null)
      .nullable()
      .optional(),
  })
  .refine((a) => a.outcome !== "fail" || Boolean(a.note), { message: "Say what is wrong: a failed item needs a note.", path: ["note"] });
export type AnswerChange = z.output<typeof answerChangeSchema>;

export const answerPatchSchema = z.strictObject({
  answers: z.array(answerChangeSchema).min(1, "Send at least one answer.").max(200, "Send at most 200 answers at a time."),
});
export type AnswerPatch = z.output<typeof answerPatchSchema>;

/** Signing takes no fields: who and when come from the session and the server's clock. */
export const signInspectionSchema = z.strictObject({});

export const tagOutReasonSchema = z.strictObject({ reason: text(500, "Give the reason.") });

export const templateItemSchema = z.strictObject({
  key: z.string().regex(ITEM_KEY_PATTERN, "Use lowercase letters, digits and dashes.").optional(),
  area: z.enum(INSPECTION_AREAS, { error: "Choose an area." }),
  text: text(200, "Say what to check."),
  guidance: z.string().trim().max(500).transform((s) => s.normalize("NFC")).default(""),
  critical: z.boolean().default(false),
  photoOnFail: z.boolean().default(false),
  lockout: z.boolean().default(false),
});

export const templateInputSchema = z.strictObject({
  name: text(100, "Give the checklist a name."),
  cadence: z.enum(CADENCES, { error: "Choose how often it is done." }),
  items: z
    .array(templateItemSchema)
    .min(1, "A checklist needs at least one item.")
    .max(60, "Keep a checklist to 60 items.")
    .refine((items) => new Set(items.flatMap((i) => (i.key ? [i.key] : []))).size === items.filter((i) => i.key).length, "Two items share a key."),
});
export type TemplateInput = z.output<typeof templateInputSchema>;

/** `?cursor=` of a paginated list: the `nextCursor` of the page before. */
export const pageQuerySchema = z.strictObject({
  cursor: z
    .string()
    .regex(/^\d{13}_[a-z2-7]{24}$/, "Not a valid page cursor.")
    .optional(),
});
