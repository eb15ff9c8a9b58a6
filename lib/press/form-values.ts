/**
 * Turns typed form values (in the user's units) into SI values for the zod schemas. One place for
 * the rule: quantity fields go through lib/units, blanks become null/absent, bad numbers stay as
 * text so the schema reports them on the right field.
 */
import { fromDisplay, parseNumberInput, toDisplay, type QuantityKind, type UnitSystem } from "@/lib/units";
import { SPEC_FIELDS } from "./component-fields";
import type { ComponentKind } from "@/lib/validation/component-spec";
import { fieldErrorsOf, type FieldErrors } from "@/lib/validation/field-errors";
import { echoValues } from "@/lib/action-state";

export type FormValues = Record<string, string>;

export function formValues(form: FormData): FormValues {
  return echoValues(form);
}

/** A typed quantity → SI number; "" → undefined; not a number → the text (the schema rejects it). */
export function quantityValue(text: string | undefined, kind: QuantityKind, units: UnitSystem): number | string | undefined {
  if (text === undefined || text.trim() === "") return undefined;
  const n = parseNumberInput(text);
  return n === null ? text : fromDisplay(kind, n, units);
}

export function plainNumber(text: string | undefined): number | string | undefined {
  if (text === undefined || text.trim() === "") return undefined;
  const n = parseNumberInput(text);
  return n === null ? text : n;
}

export function optionalText(text: string | undefined): string | null {
  return text === undefined || text.trim() === "" ? null : text.trim();
}

/** The spec object of a component form: fields named `spec.<name>`, per SPEC_FIELDS of the kind. */
export function specFromForm(kind: ComponentKind, values: FormValues, units: UnitSystem): Record<string, unknown> {
  const spec: Record<string, unknown> = {};
  for (const field of SPEC_FIELDS[kind]) {
    const raw = values[`spec.${field.name}`];
    let value: unknown;
    if (field.type === "quantity") value = quantityValue(raw, field.quantity, units);
    else if (field.type === "number") value = plainNumber(raw);
    else value = raw === undefined || raw.trim() === "" ? undefined : raw.trim();
    if (value !== undefined) spec[field.name] = value;
  }
  return spec;
}

/** "12.50" → 1250 cents; blank → null; nonsense → the text (rejected by the schema). */
export function centsValue(text: string | undefined): number | string | null {
  if (text === undefined || text.trim() === "") return null;
  const n = parseNumberInput(text.replace(/^[^\d.-]+/, ""));
  return n === null ? text : Math.round(n * 100);
}

/** zod issue paths → form field names ("spec.boreMm"). */
export function fieldErrorsFrom(issues: Parameters<typeof fieldErrorsOf>[0]): FieldErrors {
  return fieldErrorsOf(issues);
}

/** An SI value shown in a form field in the user's units, trimmed of float noise. */
export function displayValue(value: number | null | undefined, kind: QuantityKind, units: UnitSystem): string {
  if (value === null || value === undefined) return "";
  return String(Number(toDisplay(kind, value, units).toPrecision(6)));
}
