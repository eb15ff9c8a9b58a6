/**
 * Service-log form values (in the user's units) → the zod schemas' input (SI, cents). Blanks become
 * absent; bad numbers stay as text so the schema reports them on the right field.
 */
import { centsValue, optionalText, plainNumber, quantityValue, type FormValues } from "@/lib/press/form-values";
import type { UnitSystem } from "@/lib/units";

/** "2 × filter element" or "2 x filter element" → quantity 2; a line without a count → 1. */
export function partsFromText(text: string | undefined): { description: string; quantity: number }[] {
  return (text ?? "")
    .split(/\r?\n/)
    .map((line) => line.trim())
    .filter(Boolean)
    .map((line) => {
      const m = /^(\d+(?:[.,]\d+)?)\s*(?:[x×*]\s*)?(.+)$/i.exec(line);
      return m ? { quantity: Number(m[1]!.replace(",", ".")), description: m[2]!.trim() } : { quantity: 1, description: line };
    });
}

export function partsToText(parts: readonly { description: string; quantity: number }[]): string {
  return parts.map((p) => `${p.quantity} × ${p.description}`).join("\n");
}

/** The correctable fields, shared by a new entry and a correction. */
export function correctionFromForm(values: FormValues, units: UnitSystem): Record<string, unknown> {
  return {
    performedOn: values.performedOn ?? "",
    parts: partsFromText(values.parts),
    costCents: centsValue(values.cost),
    iso4406: optionalText(values.iso4406),
    reliefFoundBar: quantityValue(values.reliefFound, "pressure", units) ?? null,
    reliefSetBar: quantityValue(values.reliefSet, "pressure", units) ?? null,
    notes: optionalText(values.notes),
  };
}

export function entryFromForm(values: FormValues, units: UnitSystem): Record<string, unknown> {
  return {
    kind: values.kind ?? "",
    hours: plainNumber(values.hours) ?? null,
    componentId: optionalText(values.componentId),
    replacementLabel: values.kind === "hose-replaced" ? optionalText(values.replacementLabel) : null,
    ...correctionFromForm(values, units),
  };
}

export function taskFromForm(values: FormValues): Record<string, unknown> {
  return {
    title: values.title ?? "",
    kind: values.kind ?? "",
    intervalDays: plainNumber(values.intervalDays) ?? null,
    intervalHours: plainNumber(values.intervalHours) ?? null,
  };
}

/** Form field names for schema paths that differ (SI names → the typed fields). */
export const ENTRY_FIELD_NAMES: Record<string, string> = { costCents: "cost", reliefFoundBar: "reliefFound", reliefSetBar: "reliefSet" };
