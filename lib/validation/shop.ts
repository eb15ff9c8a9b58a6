import { z } from "zod";
import type { OpeningHours } from "@/db/schema/shops";
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

export const WEEKDAY_NAMES = ["Monday", "Tuesday", "Wednesday", "Thursday", "Friday", "Saturday", "Sunday"] as const;

const clock = /^(?:([01]\d|2[0-3]):([0-5]\d)|(24):(00))$/;
const toMinutes = (v: string): number | null => {
  const m = clock.exec(v);
  return m ? Number(m[1] ?? m[3]) * 60 + Number(m[2] ?? m[4]) : null;
};

/**
 * Opening hours from the settings form: `limit` = "on" to use them, then per weekday i (0 = Monday)
 * `open-i` = "on" with `opens-i` / `closes-i` as HH:MM. Errors are keyed `day-i`.
 */
export function openingHoursFromForm(values: Record<string, string>): { hours: OpeningHours | null } | { fieldErrors: Record<string, string[]> } {
  if (values.limit !== "on") return { hours: null };
  const fieldErrors: Record<string, string[]> = {};
  const hours: OpeningHours = WEEKDAY_NAMES.map((_, i) => {
    if (values[`open-${i}`] !== "on") return null;
    const opens = toMinutes(values[`opens-${i}`] ?? "");
    const closes = toMinutes(values[`closes-${i}`] ?? "");
    if (opens === null || closes === null) fieldErrors[`day-${i}`] = ["Give opening and closing times like 09:00 and 18:00."];
    else if (closes <= opens) fieldErrors[`day-${i}`] = ["Closing must be after opening."];
    return opens !== null && closes !== null ? { opens, closes } : null;
  });
  return Object.keys(fieldErrors).length > 0 ? { fieldErrors } : { hours };
}
