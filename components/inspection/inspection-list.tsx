import Link from "next/link";
import type { InspectionSummary } from "@/lib/data/inspection-lists";
import { CADENCE_LABELS } from "@/lib/inspections/labels";
import { formatWhen } from "./inspection-record";

const RESULT = { pass: "Passed", fail: "Failed" } as const;

/** A compact list of inspections; each row links to its record (or its run while open). */
export function InspectionList({ rows, timeZone, showPress = true, empty }: { rows: InspectionSummary[]; timeZone: string; showPress?: boolean; empty: string }) {
  if (rows.length === 0) return <p className="text-sm text-steel-600">{empty}</p>;
  return (
    <ul className="flex flex-col divide-y divide-steel-100" data-testid="inspection-list">
      {rows.map((r) => (
        <li key={r.id} className="flex flex-wrap items-baseline justify-between gap-x-3 gap-y-0.5 py-2 text-sm">
          <Link href={r.signedAt ? `/inspections/${r.id}` : `/inspections/${r.id}/run`} className="font-medium text-ink underline decoration-steel-300 underline-offset-2">
            {showPress ? `${r.pressName} — ` : ""}
            {r.templateName}
          </Link>
          <span className="text-steel-600">
            {r.signedAt ? (
              <>
                <span className={r.result === "fail" ? "font-semibold text-fail" : "text-ok"}>{r.result ? RESULT[r.result] : ""}</span> · signed {formatWhen(r.signedAt, timeZone)} by {r.signerName}
              </>
            ) : (
              <>
                {CADENCE_LABELS[r.cadence]} · started {formatWhen(r.startedAt, timeZone)}
              </>
            )}
          </span>
        </li>
      ))}
    </ul>
  );
}
