/** The costed parts list of a press being planned or built. Pure: money in integer cents. */
export type PartLine = {
  id: string;
  kind: string;
  label: string;
  maker: string | null;
  partNumber: string | null;
  supplier: string | null;
  costCents: number | null;
  purchased: boolean;
};

export type PartsTotals = { totalCents: number; boughtCents: number; toBuyCents: number; unpricedCount: number; toBuyCount: number };

export function partsTotals(lines: PartLine[]): PartsTotals {
  let boughtCents = 0;
  let toBuyCents = 0;
  let unpricedCount = 0;
  let toBuyCount = 0;
  for (const line of lines) {
    if (line.costCents === null) unpricedCount += 1;
    if (!line.purchased) toBuyCount += 1;
    const cost = line.costCents ?? 0;
    if (line.purchased) boughtCents += cost;
    else toBuyCents += cost;
  }
  return { totalCents: boughtCents + toBuyCents, boughtCents, toBuyCents, unpricedCount, toBuyCount };
}

export function formatMoney(cents: number | null, currency: string): string {
  if (cents === null) return "—";
  return new Intl.NumberFormat("en", { style: "currency", currency }).format(cents / 100);
}
