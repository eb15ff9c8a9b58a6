/**
 * Runs the shared schema over the calculator's form and words its complaints for the person
 * typing: limits in their display units, one message per input.
 */
import type * as z from "zod/mini";
import type { SizingInput } from "@/lib/hydraulics/types";
import { displayUnit, formatNumber, toDisplay, type UnitSystem } from "@/lib/units";
import { sizingInputSchema } from "@/lib/validation/sizing";
import { FIELD_BY_PATH, FIELDS, rawInput, type FieldDef, type FieldId, type FormState } from "./form-model";

export type FormErrors = Partial<Record<FieldId, string>>;

export type FormCheck = { ok: true; input: SizingInput; errors: FormErrors } | { ok: false; errors: FormErrors; other: string[] };

function limitText(field: FieldDef, si: number, system: UnitSystem): string {
  if (field.kind === "count") return String(si);
  if (field.kind === "percent") return `${formatNumber(si * 100)} %`;
  return `${formatNumber(toDisplay(field.kind, si, system))} ${displayUnit(field.kind, system).symbol}`;
}

function messageFor(issue: z.core.$ZodIssue, field: FieldDef, text: string, system: UnitSystem): string {
  switch (issue.code) {
    case "too_small":
      return `Enter at least ${limitText(field, Number(issue.minimum), system)}.`;
    case "too_big":
      return `Enter at most ${limitText(field, Number(issue.maximum), system)}.`;
    case "invalid_type":
      if (issue.expected === "int") return "Enter a whole number.";
      return text.trim() === "" ? "Required." : "Enter a number.";
    default:
      return issue.message;
  }
}

export function checkForm(form: FormState): FormCheck {
  const parsed = sizingInputSchema.safeParse(rawInput(form));
  if (parsed.success) return { ok: true, input: parsed.data, errors: {} };
  const errors: FormErrors = {};
  const other: string[] = [];
  for (const issue of parsed.error.issues) {
    const id = FIELD_BY_PATH.get(issue.path.join("."));
    if (!id) other.push(issue.message);
    else errors[id] ??= messageFor(issue, FIELDS[id], form.values[id], form.system);
  }
  return { ok: false, errors, other };
}
