/** CSV of a press's service log. Pure: entries in, CSV text out (quantities in SI, money in the shop's currency). */
import { toCsv } from "@/lib/csv";
import type { ServiceEntry } from "@/lib/data/service-log";
import { SERVICE_KIND_LABELS } from "./starting-plan";

type Row = Omit<ServiceEntry, "id" | "pressId" | "createdAt">;

export function serviceLogCsv(rows: readonly Row[], currency: string): string {
  return toCsv(
    ["date", "work", "hour meter (h)", "part acted on", "parts used", `cost (${currency})`, "ISO 4406", "relief found (bar)", "relief set (bar)", "by", "notes", "corrected"],
    rows.map((r) => [
      r.performedOn,
      SERVICE_KIND_LABELS[r.kind],
      r.hours,
      r.componentLabel,
      r.parts.map((p) => `${p.quantity} × ${p.description}`).join("; "),
      r.costCents === null ? null : (r.costCents / 100).toFixed(2),
      r.iso4406,
      r.reliefFoundBar,
      r.reliefSetBar,
      r.performedByName,
      r.notes,
      r.corrected ? "yes" : "",
    ]),
  );
}
