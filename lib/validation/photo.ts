import { z } from "zod";
import { TIME_CURSOR_PATTERN } from "@/lib/data/time-cursor";
import { PHOTO_KINDS } from "@/db/schema/photos";
import { ID_PATTERN } from "@/lib/ids";
import { MAX_CAPTION_LENGTH } from "@/lib/photos/kinds";

const recordId = (what: string) => z.string().regex(ID_PATTERN, `Not a valid ${what} id.`);

export const photoKindSchema = z.enum(PHOTO_KINDS, { error: "Choose what the photo shows." });

/** Blank captions are stored as none. */
const captionSchema = z
  .string()
  .trim()
  .max(MAX_CAPTION_LENGTH, `Keep the caption to ${MAX_CAPTION_LENGTH} characters.`)
  .transform((caption) => caption || null);

/** The upload route's input: the record to attach to, checked on the server before any URL is signed. */
export const photoUploadInputSchema = z.strictObject({
  pressId: recordId("press"),
  componentId: recordId("part").optional(),
  serviceEntryId: recordId("service entry").optional(),
  problemReportId: recordId("problem report").optional(),
  inspectionItemId: recordId("inspection item").optional(),
  kind: photoKindSchema,
  caption: captionSchema.optional(),
});
export type PhotoUploadInput = z.input<typeof photoUploadInputSchema>;

/** The fields a photo PATCH may carry (no defaults: a PATCH changes only what it sends). */
export const photoPatchFields = z.strictObject({ caption: captionSchema.nullable().optional(), kind: photoKindSchema.optional() });

export const photoPatchSchema = photoPatchFields
  .refine((patch) => patch.caption !== undefined || patch.kind !== undefined, "Change the caption or the kind.");
export type PhotoPatch = z.infer<typeof photoPatchSchema>;

/** `?kind=&cursor=&limit=` on the gallery's list (the cursor is the `nextCursor` of the page before). */
export const photoListQuerySchema = z.strictObject({
  kind: photoKindSchema.optional(),
  cursor: z.string().regex(TIME_CURSOR_PATTERN, "Not a cursor from this list.").optional(),
  limit: z.coerce.number().int().min(1).max(100).optional(),
});
