import { formatQuantity, type UnitSystem } from "@/lib/units";

export type ForceUnit = "kN" | "tf" | "shortTon";

/**
 * A force in the system's unit first, then the other two common ones, each labelled: kN,
 * tonne-force (1000 kgf) and US short tons (2000 lbf) are easy to confuse (hydraulics reference, trap 1).
 */
export function forceInThree(kN: number, system: UnitSystem): { unit: ForceUnit; text: string }[] {
  const order: ForceUnit[] = system === "metric" ? ["kN", "tf", "shortTon"] : ["shortTon", "kN", "tf"];
  return order.map((unit) => ({ unit, text: formatQuantity("force", kN, system, { unit }) }));
}
