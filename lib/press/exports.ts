/** CSV exports of a press's components and parts list. Pure: rows in, CSV text out. */
import { toCsv } from "@/lib/csv";
import type { ComponentSpec } from "@/lib/validation/component-spec";
import { partsTotals, type PartLine } from "./parts-list";

type ExportRow = PartLine & { spec: ComponentSpec; installedOn: string | null; removedOn: string | null; removalReason: string | null };

/** Every component, installed and removed, with its spec as SI key=value pairs. */
export function componentsCsv(rows: ExportRow[]): string {
  return toCsv(
    ["kind", "label", "spec (SI)", "maker", "part number", "supplier", "cost", "installed on", "removed on", "removal reason"],
    rows.map((r) => [
      r.kind,
      r.label,
      Object.entries(r.spec)
        .filter(([k]) => k !== "kind")
        .map(([k, v]) => `${k}=${v}`)
        .join("; "),
      r.maker,
      r.partNumber,
      r.supplier,
      r.costCents === null ? null : (r.costCents / 100).toFixed(2),
      r.installedOn,
      r.removedOn,
      r.removalReason,
    ]),
  );
}

/** The installed parts with cost and purchase state, then the totals. */
export function partsListCsv(rows: PartLine[], currency: string): string {
  const totals = partsTotals(rows);
  const money = (cents: number | null) => (cents === null ? null : (cents / 100).toFixed(2));
  return toCsv(
    ["kind", "label", "maker", "part number", "supplier", `cost (${currency})`, "bought"],
    [
      ...rows.map((r) => [r.kind, r.label, r.maker, r.partNumber, r.supplier, money(r.costCents), r.purchased ? "yes" : "no"]),
      [],
      ["total", "", "", "", "", money(totals.totalCents), ""],
      ["bought", "", "", "", "", money(totals.boughtCents), ""],
      ["still to buy", "", "", "", "", money(totals.toBuyCents), String(totals.toBuyCount)],
    ],
  );
}
