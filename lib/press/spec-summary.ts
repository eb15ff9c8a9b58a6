import { formatQuantity, type UnitSystem } from "@/lib/units";
import type { ComponentSpec } from "@/lib/validation/component-spec";
import { SPEC_FIELDS } from "./component-fields";

/** A one-line summary of a part's figures in the user's units, e.g. "Bore 127 mm · Rod 63.5 mm". */
export function specSummary(spec: ComponentSpec, units: UnitSystem): string {
  const values = spec as unknown as Record<string, unknown>;
  const parts: string[] = [];
  for (const field of SPEC_FIELDS[spec.kind]) {
    const v = values[field.name];
    if (v === undefined || v === null || v === "") continue;
    const label = field.label.replace(/\s*\(.*\)$/, "");
    if (field.type === "quantity" && typeof v === "number") parts.push(`${label} ${trimZeros(formatQuantity(field.quantity, v, units, { significant: 4 }))}`);
    else if (field.type === "number") parts.push(`${label} ${v} ${field.unit}`);
    else parts.push(`${label}: ${String(v)}`);
  }
  return parts.join(" · ");
}

/** "127.0 mm" → "127 mm", "63.50 mm" → "63.5 mm": four significant digits without padding. */
function trimZeros(text: string): string {
  return text.replace(/(\.\d*?)0+(?=\s)/, "$1").replace(/\.(?=\s)/, "");
}
