import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { EntryPhotos } from "@/components/service/entry-photos";
import { ServiceEntryForm } from "@/components/service/service-entry-form";
import { Card, PageTitle } from "@/components/ui/card";
import { showQuantity } from "@/components/ui/quantity";
import { orPageError, requireShopContext } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { listServiceEntryPhotos } from "@/lib/data/photos";
import { getPress } from "@/lib/data/presses";
import { getServiceEntry, listServiceRevisions } from "@/lib/data/service-log";
import { getServicePlan } from "@/lib/data/service-plan";
import { formatMoney } from "@/lib/press/parts-list";
import { displayValue } from "@/lib/press/form-values";
import { partsToText } from "@/lib/service/entry-form";
import { formatLocalDate } from "@/lib/service/format";
import { SERVICE_KIND_LABELS } from "@/lib/service/starting-plan";
import { correctServiceEntryAction } from "../actions";

export const metadata: Metadata = { title: "Service entry" };

const FIELD_LABELS: Record<string, string> = {
  performedOn: "Date",
  parts: "Parts used",
  costCents: "Cost (cents)",
  iso4406: "ISO 4406",
  reliefFoundBar: "Relief found (bar)",
  reliefSetBar: "Relief left (bar)",
  notes: "Notes",
};

function shown(value: unknown): string {
  if (value === null || value === undefined || value === "") return "—";
  if (Array.isArray(value)) return partsToText(value as { description: string; quantity: number }[]) || "—";
  return String(value);
}

export default async function ServiceEntryPage({ params }: { params: Promise<{ pressId: string; entryId: string }> }) {
  const { pressId, entryId } = await params;
  const { user } = await requireShopContext();
  const actor = { userId: user.id };
  const entry = await orPageError(getServiceEntry(actor, entryId));
  if (entry.pressId !== pressId) notFound();
  const units = user.unitSystem;
  const [press, revisions, plan, photos] = await Promise.all([getPress(actor, pressId), listServiceRevisions(actor, entryId), getServicePlan(actor, pressId), listServiceEntryPhotos(actor, pressId, entryId)]);
  const canCorrect = can(press.role, "logService") && press.lifecycle !== "retired";
  const rows: [string, string][] = [
    ["Date", formatLocalDate(entry.performedOn)],
    ["Hour meter", entry.hours === null ? "—" : `${entry.hours} h`],
    ["Part", entry.componentLabel ?? "—"],
    ["Parts used", shown(entry.parts)],
    ["Cost", formatMoney(entry.costCents, press.currency)],
    ...(entry.iso4406 ? [["ISO 4406", entry.iso4406] as [string, string]] : []),
    ...(entry.kind === "relief-checked"
      ? ([
          ["Relief found at", showQuantity("pressure", entry.reliefFoundBar, units)],
          ["Relief left at", showQuantity("pressure", entry.reliefSetBar, units)],
        ] as [string, string][])
      : []),
    ["Logged by", entry.performedByName ?? "—"],
    ["Notes", entry.notes ?? "—"],
  ];
  return (
    <>
      <PageTitle
        title={SERVICE_KIND_LABELS[entry.kind]}
        subtitle={
          <Link href={`/presses/${pressId}#service`} className="underline">
            {press.name}
          </Link>
        }
      />
      <div className="grid gap-4 lg:grid-cols-2 [&>*]:min-w-0">
        <Card title="Entry">
          <dl className="grid gap-y-2 text-sm">
            {rows.map(([label, value]) => (
              <div key={label} className="flex justify-between gap-3 border-b border-steel-100 py-1">
                <dt className="text-steel-600">{label}</dt>
                <dd className="whitespace-pre-line text-right">{value}</dd>
              </div>
            ))}
          </dl>
        </Card>
        <Card title={`Corrections (${revisions.length})`}>
          {revisions.length === 0 ? (
            <p className="text-sm text-steel-600">Not corrected since it was logged.</p>
          ) : (
            <ul className="flex flex-col gap-3 text-sm" data-testid="service-revisions">
              {revisions.map((r) => (
                <li key={r.id}>
                  <p className="font-medium">
                    {r.changedByName ?? "Someone"} · {r.changedAt.toISOString().slice(0, 16).replace("T", " ")} UTC
                  </p>
                  <ul className="pl-4 text-steel-700">
                    {Object.entries(r.changes).map(([field, change]) => (
                      <li key={field}>
                        {FIELD_LABELS[field] ?? field}: {shown(change.from)} → {shown(change.to)}
                      </li>
                    ))}
                  </ul>
                </li>
              ))}
            </ul>
          )}
        </Card>
        <div className="lg:col-span-2">
          <Card title={`Photos (${photos.length})`}>
            <EntryPhotos
              pressId={pressId}
              entryId={entryId}
              photos={photos.map((p) => ({ id: p.id, url: p.url, thumbUrl: p.thumbUrl, thumbWidth: p.thumbWidth, thumbHeight: p.thumbHeight, caption: p.caption, kind: p.kind }))}
              canAttach={can(press.role, "attachPhoto") && press.lifecycle !== "retired"}
            />
          </Card>
        </div>
        {canCorrect ? (
          <div className="lg:col-span-2">
            <Card title="Correct this entry">
              <p className="mb-3 text-sm text-steel-600">The work done and the hour-meter reading stay as logged; every correction is kept above with who made it.</p>
              <ServiceEntryForm
                action={correctServiceEntryAction.bind(null, pressId, entryId)}
                units={units}
                currency={press.currency}
                today={plan.today}
                currentHours={press.hourMeter}
                hoses={[]}
                correction={{
                  kind: entry.kind,
                  values: {
                    performedOn: entry.performedOn,
                    parts: partsToText(entry.parts),
                    cost: entry.costCents === null ? "" : (entry.costCents / 100).toFixed(2),
                    iso4406: entry.iso4406 ?? "",
                    reliefFound: displayValue(entry.reliefFoundBar, "pressure", units),
                    reliefSet: displayValue(entry.reliefSetBar, "pressure", units),
                    notes: entry.notes ?? "",
                  },
                }}
              />
            </Card>
          </div>
        ) : null}
      </div>
    </>
  );
}
