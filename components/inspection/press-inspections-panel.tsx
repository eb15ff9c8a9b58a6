import { startInspectionAction } from "@/app/(app)/inspections/actions";
import type { InspectionDueItem } from "@/lib/data/inspection-due";
import type { InspectionPage } from "@/lib/data/inspection-lists";
import type { ChainReport } from "@/lib/data/inspection-sign";
import { formatWhen } from "./inspection-record";
import { InspectionList } from "./inspection-list";
import { StartInspectionForm } from "./start-inspection-form";

type Props = {
  pressId: string;
  due: InspectionDueItem[];
  recent: InspectionPage;
  chain: (ChainReport & { brokenCount: number }) | null;
  templates: { value: string; label: string }[];
  timeZone: string;
};

/** The press page's inspections: what is due, whether the signed record is intact, the latest runs. */
export function PressInspectionsPanel({ pressId, due, recent, chain, templates, timeZone }: Props) {
  return (
    <div className="flex flex-col gap-4">
      {chain ? (
        chain.intact ? (
          <p className="rounded-md bg-ok-soft px-3 py-2 text-sm text-ok ring-1 ring-ok/30" data-testid="chain-status">
            Record intact: {chain.checked === 1 ? "1 signed inspection" : `${chain.checked} signed inspections`} checked against the chain.
          </p>
        ) : (
          <div role="alert" className="rounded-md bg-fail-soft px-3 py-2 text-sm text-fail ring-1 ring-fail/30" data-testid="chain-status">
            <p className="font-semibold">
              Record broken: {chain.brokenCount === 1 ? "1 signed inspection no longer matches" : `${chain.brokenCount} signed inspections no longer match`} its chain.
            </p>
            <ul className="mt-1 list-inside list-disc">
              {chain.broken.map((b) => (
                <li key={b.id}>
                  Record no. {b.chainSeq} ({b.reason === "content" ? "its content changed" : b.reason === "link" ? "its link to the record before changed" : "a record before it is missing"}) —{" "}
                  <a href={`/inspections/${b.id}`} className="underline">
                    open it
                  </a>
                </li>
              ))}
            </ul>
          </div>
        )
      ) : null}
      {due.length > 0 ? (
        <ul className="flex flex-col gap-1 text-sm" data-testid="press-due">
          {due.map((d) => (
            <li key={d.templateId} className={d.state === "overdue" ? "font-semibold text-fail" : "text-warn"}>
              {d.name}: {d.state === "overdue" ? "overdue" : "due soon"}
              {d.dueAt ? ` (${formatWhen(d.dueAt, timeZone)})` : " (never done)"}
            </li>
          ))}
        </ul>
      ) : null}
      {templates.length > 0 ? <StartInspectionForm action={startInspectionAction} templates={templates} pressId={pressId} /> : null}
      <InspectionList rows={recent.rows} timeZone={timeZone} showPress={false} empty="No inspections yet." />
    </div>
  );
}
