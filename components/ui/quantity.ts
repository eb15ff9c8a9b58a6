import { formatQuantity, type QuantityKind, type UnitSystem } from "@/lib/units";

/** A stored SI value in the user's units, or a dash when it was never recorded. */
export function showQuantity(kind: QuantityKind, value: number | null, units: UnitSystem): string {
  return value == null ? "—" : formatQuantity(kind, value, units);
}
