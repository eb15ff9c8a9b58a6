import type { InspectionItemView, InspectionView } from "@/lib/data/inspections";
import { AREA_LABELS, CADENCE_LABELS, OUTCOME_LABELS } from "@/lib/inspections/labels";

/** Date and time in the shop's zone, with the zone named (records are read later, elsewhere). */
export function formatWhen(date: Date, timeZone: string): string {
  return new Intl.DateTimeFormat("en-GB", { timeZone, day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit", timeZoneName: "short" }).format(date);
}

const OUTCOME_STYLE = { pass: "text-ok", fail: "font-semibold text-fail", na: "text-steel-600" } as const;

function Outcome({ item }: { item: InspectionItemView }) {
  return item.outcome ? <span className={OUTCOME_STYLE[item.outcome]}>{OUTCOME_LABELS[item.outcome]}</span> : <span className="text-steel-500">Not answered</span>;
}

/** An inspection's items, answers and — once signed — its signature and chain value. Screen and print. */
export function InspectionRecord({ inspection, timeZone }: { inspection: InspectionView; timeZone: string }) {
  const facts: [string, string][] = [
    ["Press", inspection.pressName],
    ["Checklist", `${inspection.templateName} (${CADENCE_LABELS[inspection.cadence]})`],
    ["Started", `${formatWhen(inspection.startedAt, timeZone)} by ${inspection.startedByName ?? "—"}`],
    ["Result", inspection.result === "fail" ? "Failed" : inspection.result === "pass" ? "Passed" : "In progress"],
  ];
  if (inspection.signedAt) {
    facts.push(["Signed by", inspection.signerName ?? "—"], ["Signed at", formatWhen(inspection.signedAt, timeZone)], ["Record no.", String(inspection.chainSeq ?? "—")]);
  }
  return (
    <article className="flex flex-col gap-4 print:gap-2" data-testid="inspection-record">
      <dl className="grid grid-cols-1 gap-x-6 gap-y-1 text-sm sm:grid-cols-2 print:grid-cols-2">
        {facts.map(([label, value]) => (
          <div key={label} className="flex justify-between gap-3 border-b border-steel-100 py-1">
            <dt className="text-steel-600">{label}</dt>
            <dd className="text-right font-medium">{value}</dd>
          </div>
        ))}
      </dl>
      <table className="w-full text-left text-sm">
        <thead className="border-b border-steel-300 text-xs uppercase text-steel-600">
          <tr>
            <th className="py-1 pr-2">Item</th>
            <th className="py-1 pr-2">Answer</th>
            <th className="py-1">Note</th>
          </tr>
        </thead>
        <tbody>
          {inspection.items.map((item) => (
            <tr key={item.key} className="border-b border-steel-100 align-top break-inside-avoid">
              <td className="py-1.5 pr-2">
                <span className="block text-xs text-steel-500">{AREA_LABELS[item.area]}</span>
                {item.text}
                {item.critical ? <span className="ml-1 text-xs font-semibold text-fail">critical</span> : null}
              </td>
              <td className="py-1.5 pr-2">
                <Outcome item={item} />
                {item.photos > 0 ? <span className="block text-xs text-steel-500">{item.photos} photo{item.photos === 1 ? "" : "s"}</span> : null}
              </td>
              <td className="py-1.5 break-words">{item.note ?? ""}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {inspection.signedAt && inspection.chainHash ? (
        <p className="text-xs text-steel-600" data-testid="signature">
          Signed by <strong className="text-ink">{inspection.signerName}</strong> at {formatWhen(inspection.signedAt, timeZone)}. Chain value (HMAC-SHA-256):{" "}
          <code className="font-mono break-all text-ink">{inspection.chainHash}</code>
        </p>
      ) : null}
    </article>
  );
}
