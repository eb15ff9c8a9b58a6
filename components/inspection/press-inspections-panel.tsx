import { startInspectionAction } from "@/app/(app)/inspections/actions";
import type { InspectionDueItem } from "@/lib/data/inspection-due";
import type { InspectionPage } from "@/lib/data/inspection-lists";
import type { ChainStatus } from "@/lib/data/chain-status";
import { ChainCheck } from "./chain-check";
import { formatWhen } from "./inspection-record";
import { InspectionList } from "./inspection-list";
import { StartInspectionForm } from "./start-inspection-form";

type Props = {
  pressId: string;
  due: InspectionDueItem[];
  recent: InspectionPage;
  chain: ChainStatus | null;
  templates: { value: string; label: string }[];
  timeZone: string;
};

/** The press page's inspections: what is due, whether the signed record is intact, the latest runs. */
export function PressInspectionsPanel({ pressId, due, recent, chain, templates, timeZone }: Props) {
  return (
    <div className="flex flex-col gap-4">
      {chain ? (
        <ChainCheck
          pressId={pressId}
          timeZone={timeZone}
          initial={{ checked: chain.checked, intact: chain.intact, brokenCount: chain.brokenCount, broken: chain.broken, checkedAt: chain.checkedAt.toISOString() }}
        />
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
