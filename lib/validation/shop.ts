import { z } from "zod";
import { ID_PATTERN } from "@/lib/ids";

const zones = new Set(Intl.supportedValuesOf("timeZone").concat("UTC"));

export const shopSettingsSchema = z.strictObject({
  name: z.string().trim().min(1, "Give the shop a name.").max(100, "Use at most 100 characters."),
  timeZone: z.string().refine((v) => zones.has(v), "Choose a time zone from the list."),
});

export const memberRoleSchema = z.strictObject({
  userId: z.string().regex(ID_PATTERN),
  role: z.enum(["manager", "inspector", "member"]),
});

export function timeZoneOptions(): string[] {
  return [...zones].sort();
}
