import type { Metadata } from "next";
import Link from "next/link";
import { DueList, type DueRow } from "@/components/due/due-list";
import { PressCard } from "@/components/press/press-card";
import { buttonClass } from "@/components/ui/button";
import { Card, PageTitle } from "@/components/ui/card";
import { RoleBadge } from "@/components/ui/role-badge";
import { requireShopContext } from "@/lib/auth/current";
import { listShopStatuses } from "@/lib/data/press-status";
import { listPresses } from "@/lib/data/presses";
import { listDueForActor as listInspectionsDue } from "@/lib/data/inspection-due";
import { listDueForActor } from "@/lib/data/service-due";
import { LIFECYCLE_LABELS } from "@/lib/press-labels";

export const metadata: Metadata = { title: "Dashboard" };

export default async function DashboardPage() {
  const { user, shop } = await requireShopContext();
  const actor = { userId: user.id };
  const [presses, due, statuses] = await Promise.all([
    listPresses(actor, shop.id),
    listDueForActor(actor, { shopId: shop.id }),
    listShopStatuses(actor, shop.id),
  ]);
  const inspectionsDue = await listInspectionsDue(actor, presses.map((p) => p.id));
  const pressNames = new Map(presses.map((p) => [p.id, p.name]));
  const dueRows: DueRow[] = [
    ...due.map((d) => ({ key: `${d.kind}:${d.taskId}`, kind: d.kind, title: d.title, pressName: d.pressName, href: `/presses/${d.pressId}#service`, state: d.state, dueDate: d.dueDate, dueHours: d.dueHours })),
    ...[...inspectionsDue].flatMap(([pressId, items]) =>
      items.map((i) => ({ key: `inspection:${pressId}:${i.templateId}`, kind: "inspection" as const, title: i.name, pressName: pressNames.get(pressId), href: `/presses/${pressId}#inspections`, state: i.state, dueDate: i.dueAt, dueHours: null })),
    ),
  ].sort((a, b) => Number(b.state === "overdue") - Number(a.state === "overdue") || (a.dueDate?.getTime() ?? Infinity) - (b.dueDate?.getTime() ?? Infinity));
  const byLifecycle = Object.entries(LIFECYCLE_LABELS).map(([key, label]) => ({
    label,
    count: presses.filter((p) => p.lifecycle === key).length,
  }));

  return (
    <>
      <PageTitle
        title={shop.name}
        subtitle={
          <span className="inline-flex items-center gap-2">
            Signed in as {user.displayName} <RoleBadge role={shop.role} />
          </span>
        }
        actions={
          <Link href="/sizing" className={buttonClass("secondary")}>
            Size a new press
          </Link>
        }
      />
      <div className="grid gap-4 lg:grid-cols-[2fr_1fr]">
        <section aria-labelledby="presses-heading">
          <h2 id="presses-heading" className="mb-3 text-lg font-semibold">
            Presses
          </h2>
          {presses.length === 0 ? (
            <Card>
              <p className="text-sm text-steel-600">
                No presses in this shop yet. Start with the sizing calculator to plan one.
              </p>
            </Card>
          ) : (
            <div className="grid gap-3 sm:grid-cols-2">
              {presses.map((press) => (
                <PressCard key={press.id} press={press} units={user.unitSystem} status={statuses.get(press.id)} />
              ))}
            </div>
          )}
        </section>
        <div className="flex flex-col gap-4">
          <Card title="Shop at a glance">
            <dl className="grid grid-cols-2 gap-3 text-sm">
              {byLifecycle.map((row) => (
                <div key={row.label} className="rounded-md bg-steel-50 p-3">
                  <dt className="text-steel-600">{row.label}</dt>
                  <dd className="font-mono text-xl font-semibold">{row.count}</dd>
                </div>
              ))}
            </dl>
          </Card>
          <Card title="Due soon and overdue">
            <DueList rows={dueRows} timeZone={shop.timeZone} testId="due-list" empty="Nothing due. Set a service plan on a press in service to see what falls due." />
          </Card>
        </div>
      </div>
    </>
  );
}
