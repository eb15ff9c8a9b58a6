import { z } from "zod";
import { PROBLEM_SEVERITIES } from "@/db/schema/problems";

// ISO 8601 with an explicit offset ("Z" or "+01:00"): a time without one has no meaning across zones.
const instant = (label: string) =>
  z.iso
    .datetime({ offset: true, local: false, error: `${label} must be an ISO 8601 date-time with an offset, e.g. 2026-07-15T09:00:00+01:00.` })
    .transform((v) => new Date(v));

export const bookingInputSchema = z.strictObject({ startsAt: instant("startsAt"), endsAt: instant("endsAt") });

/** A calendar window: `from` and `to` as above. */
export const bookingWindowSchema = z.strictObject({ from: instant("from"), to: instant("to") });

export const problemInputSchema = z.strictObject({
  description: z.string().trim().min(3, "Say what is wrong.").max(1000, "Use at most 1000 characters."),
  severity: z.enum(PROBLEM_SEVERITIES, { error: "Choose how serious it is." }),
  stopUse: z.boolean().default(false),
});

export const problemCloseSchema = z
  .strictObject({
    close: z.literal(true),
    serviceEntryId: z.string().regex(/^[a-z2-7]{24}$/, "Not a service-log entry id.").optional(),
    reason: z.string().trim().min(3, "Say how it was dealt with.").max(500).optional(),
  })
  .refine((v) => v.serviceEntryId !== undefined || v.reason !== undefined, { message: "Give a service-log entry or a reason.", path: ["reason"] });
