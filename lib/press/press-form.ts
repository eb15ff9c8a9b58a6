import type { QuantityKind, UnitSystem } from "@/lib/units";
import { optionalText, quantityValue, type FormValues } from "./form-values";

/** The quantity fields of the press form, with their kinds (SI names = schema names). */
export const PRESS_QUANTITY_FIELDS: { name: string; label: string; quantity: QuantityKind }[] = [
  { name: "ratedForceKn", label: "Rated force", quantity: "force" },
  { name: "daylightMm", label: "Daylight (open height)", quantity: "length" },
  { name: "strokeMm", label: "Stroke", quantity: "length" },
  { name: "bedWidthMm", label: "Bed width", quantity: "length" },
  { name: "bedDepthMm", label: "Bed depth", quantity: "length" },
  { name: "workingPressureBar", label: "Working pressure", quantity: "pressure" },
  { name: "reliefPressureBar", label: "Relief setting", quantity: "pressure" },
];

/** Form values in the user's units → the object pressInputSchema checks. Blank quantities become null. */
export function pressFromForm(values: FormValues, units: UnitSystem): Record<string, unknown> {
  const out: Record<string, unknown> = {
    name: values.name ?? "",
    frameType: values.frameType,
    lifecycle: values.lifecycle || undefined,
    location: optionalText(values.location),
    notes: optionalText(values.notes),
  };
  for (const f of PRESS_QUANTITY_FIELDS) out[f.name] = quantityValue(values[f.name], f.quantity, units) ?? null;
  return out;
}
