import type { Metadata } from "next";
import Link from "next/link";
import { InspectionList } from "@/components/inspection/inspection-list";
import { StartInspectionForm } from "@/components/inspection/start-inspection-form";
import { Card, PageTitle } from "@/components/ui/card";
import { requireShopContext } from "@/lib/auth/current";
import { listDueForActor } from "@/lib/data/inspection-due";
import { listShopInspections } from "@/lib/data/inspection-lists";
import { listTemplates } from "@/lib/data/inspection-templates";
import { listPresses } from "@/lib/data/presses";
import { CADENCE_LABELS } from "@/lib/inspections/labels";
import { pageQuerySchema } from "@/lib/validation/inspection";
import { formatWhen } from "@/components/inspection/inspection-record";
import { startInspectionAction } from "./actions";

export const metadata: Metadata = { title: "Inspections" };

export default async function InspectionsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { user, shop } = await requireShopContext();
  const actor = { userId: user.id };
  const query = pageQuerySchema.safeParse(await searchParams);
  const cursor = query.success ? query.data.cursor : undefined;
  const [presses, templates, open, signed] = await Promise.all([
    listPresses(actor, shop.id),
    listTemplates(actor, shop.id),
    listShopInspections(actor, shop.id, "open"),
    listShopInspections(actor, shop.id, "signed", { cursor }),
  ]);
  const due = await listDueForActor(actor, presses.map((p) => p.id));
  const dueRows = presses.flatMap((p) => (due.get(p.id) ?? []).map((d) => ({ press: p, ...d })));
  const active = presses.filter((p) => p.lifecycle !== "retired");
  return (
    <>
      <PageTitle
        title="Inspections"
        subtitle={`Checklists run at the press and signed off, for ${shop.name}.`}
        actions={
          <Link href="/inspections/templates" className="text-sm font-semibold text-oil-700 underline">
            Checklists
          </Link>
        }
      />
      <div className="grid gap-4 lg:grid-cols-2 [&>*]:min-w-0">
        <Card title="Start an inspection">
          {active.length > 0 ? (
            <StartInspectionForm
              action={startInspectionAction}
              presses={active.map((p) => ({ value: p.id, label: p.name }))}
              templates={templates.map((t) => ({ value: t.id, label: `${t.name} (${CADENCE_LABELS[t.cadence]})` }))}
            />
          ) : (
            <p className="text-sm text-steel-600">Add a press first.</p>
          )}
        </Card>
        <Card title={`Due and overdue (${dueRows.length})`}>
          {dueRows.length === 0 ? (
            <p className="text-sm text-steel-600">Nothing is due. Presses in service are checked on the weekly, monthly and yearly checklists.</p>
          ) : (
            <ul className="flex flex-col divide-y divide-steel-100 text-sm" data-testid="due-list">
              {dueRows.map((d) => (
                <li key={`${d.press.id}-${d.templateId}`} className="flex flex-wrap justify-between gap-2 py-2">
                  <Link href={`/presses/${d.press.id}#inspections`} className="font-medium underline decoration-steel-300 underline-offset-2">
                    {d.press.name} — {d.name}
                  </Link>
                  <span className={d.state === "overdue" ? "font-semibold text-fail" : "text-warn"}>
                    {d.state === "overdue" ? "Overdue" : "Due soon"}
                    {d.dueAt ? ` · ${formatWhen(d.dueAt, shop.timeZone)}` : " · never done"}
                  </span>
                </li>
              ))}
            </ul>
          )}
        </Card>
        <Card title="In progress">
          <InspectionList rows={open.rows} timeZone={shop.timeZone} empty="No inspection is in progress." />
          {open.nextCursor ? <p className="mt-2 text-xs text-steel-600">Showing the {open.rows.length} most recent.</p> : null}
        </Card>
        <Card title="Signed" actions={cursor ? <Link href="/inspections" className="text-sm underline">Newest</Link> : null}>
          <InspectionList rows={signed.rows} timeZone={shop.timeZone} empty="No inspection has been signed yet." />
          {signed.nextCursor ? (
            <Link href={`/inspections?cursor=${signed.nextCursor}`} className="mt-3 inline-block text-sm font-semibold text-oil-700 underline">
              Older inspections
            </Link>
          ) : null}
        </Card>
      </div>
    </>
  );
}
