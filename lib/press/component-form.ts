import type { UnitSystem } from "@/lib/units";
import type { ComponentKind } from "@/lib/validation/component-spec";
import { SPEC_FIELDS } from "./component-fields";
import { centsValue, displayValue, optionalText, specFromForm, type FormValues } from "./form-values";

/** A component form's values (user's units) → the object componentInputSchema checks (SI). */
export function componentFromForm(values: FormValues, units: UnitSystem): Record<string, unknown> & { kind?: string } {
  const kind = values.kind as ComponentKind | undefined;
  return {
    kind,
    label: values.label ?? "",
    spec: kind ? specFromForm(kind, values, units) : {},
    maker: optionalText(values.maker),
    partNumber: optionalText(values.partNumber),
    supplier: optionalText(values.supplier),
    costCents: centsValue(values.cost),
    purchased: values.purchased === "on",
    installedOn: optionalText(values.installedOn),
  };
}

type StoredComponent = {
  kind: ComponentKind;
  label: string;
  spec: Record<string, unknown>;
  maker: string | null;
  partNumber: string | null;
  supplier: string | null;
  costCents: number | null;
  purchased: boolean;
  installedOn: string | null;
};

/** A stored component → the strings its form shows, in the user's units. */
export function componentFormValues(c: StoredComponent, units: UnitSystem): Record<string, string> {
  const values: Record<string, string> = {
    kind: c.kind,
    label: c.label,
    maker: c.maker ?? "",
    partNumber: c.partNumber ?? "",
    supplier: c.supplier ?? "",
    cost: c.costCents === null ? "" : (c.costCents / 100).toFixed(2),
    purchased: c.purchased ? "on" : "off",
    installedOn: c.installedOn ?? "",
  };
  for (const field of SPEC_FIELDS[c.kind]) {
    const v = c.spec[field.name];
    if (v === undefined || v === null) continue;
    values[`spec.${field.name}`] = field.type === "quantity" && typeof v === "number" ? displayValue(v, field.quantity, units) : String(v);
  }
  return values;
}
