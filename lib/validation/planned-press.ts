/**
 * The "save as a planned press" form of the sizing page. The sizing input travels as one hidden
 * JSON field (SI units, as the engine takes it) and is validated by the same schema as the API.
 */
import { z } from "zod";
import { FRAME_TYPES } from "@/db/schema/presses";
import { sizingInputSchema } from "./sizing";

const sizingJson = z
  .string({ error: "The sizing input is missing; reload the page." })
  .max(20_000, "The sizing input is too large.")
  .transform((text, ctx): unknown => {
    try {
      return JSON.parse(text);
    } catch {
      ctx.addIssue({ code: "custom", message: "The sizing input is not valid; reload the page." });
      return z.NEVER;
    }
  })
  .pipe(sizingInputSchema);

export const plannedPressSchema = z.strictObject({
  name: z.string({ error: "Give the press a name." }).trim().min(1, "Give the press a name.").max(100, "Use at most 100 characters."),
  frameType: z.enum(FRAME_TYPES, { error: "Choose a frame type." }),
  sizingInput: sizingJson,
});

export type PlannedPressForm = z.output<typeof plannedPressSchema>;
