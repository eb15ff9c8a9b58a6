import type { Metadata } from "next";
import Link from "next/link";
import { PressInspectionsPanel } from "@/components/inspection/press-inspections-panel";
import { AsBuiltPanel } from "@/components/press/as-built-panel";
import { ComponentTable } from "@/components/press/component-table";
import { FreshSWR } from "@/components/ui/fresh-swr";
import { PressPhotos } from "@/components/photos/press-photos";
import { HourCorrectionForm, HourMeterForm } from "@/components/press/hour-meter-form";
import { PressTimeline } from "@/components/press/press-timeline";
import { PressService } from "@/components/service/press-service";
import { TagOutPanel } from "@/components/press/tag-out-panel";
import { SafetyCautions } from "@/components/sizing/safety-cautions";
import { buttonClass } from "@/components/ui/button";
import { Card, PageTitle } from "@/components/ui/card";
import { showQuantity as show } from "@/components/ui/quantity";
import { orPageError, requireShopContext } from "@/lib/auth/current";
import { can, canEditPress, inspectionAction } from "@/lib/auth/permissions";
import { listComponents } from "@/lib/data/components";
import { listDueForActor } from "@/lib/data/inspection-due";
import { listPressInspections } from "@/lib/data/inspection-lists";
import { pressChainStatus } from "@/lib/data/chain-status";
import { listTemplates } from "@/lib/data/inspection-templates";
import { HISTORY_SHOWN, listRecentHistory } from "@/lib/data/press-history";
import { listClearedTagOuts, listPressTagOuts } from "@/lib/data/press-tag-outs";
import { SigningUnavailableError } from "@/lib/inspections/chain-key";
import { CADENCE_LABELS } from "@/lib/inspections/labels";
import { getPress } from "@/lib/data/presses";
import { FRAME_TYPE_LABELS, LIFECYCLE_LABELS } from "@/lib/press-labels";
import { evaluateAsBuilt } from "@/lib/press/as-built";
import { ProblemForm } from "@/components/problems/problem-form";
import { ProblemList } from "@/components/problems/problem-list";
import { StatusBadge, StatusReasons } from "@/components/ui/status-badge";
import { getPressTimeZone } from "@/lib/data/bookings";
import { getPressStatus } from "@/lib/data/press-status";
import { listProblems } from "@/lib/data/problems";
import { correctHoursAction, recordHoursAction } from "./actions";
import { reportProblemAction } from "./problem-actions";

export const metadata: Metadata = { title: "Press" };

export default async function PressPage({ params }: { params: Promise<{ pressId: string }> }) {
  const { pressId } = await params;
  const { user, shop } = await requireShopContext();
  const actor = { userId: user.id };
  const press = await orPageError(getPress(actor, pressId));
  // Every list is a bounded window (newest first, with a way to the rest), so the page costs the
  // same after years of use; the access checks of these calls share one lookup (memberPress).
  const [installed, history, status, problems, timeZone, tagOuts, cleared, due, recent, chain, templates] = await Promise.all([
    listComponents(actor, pressId),
    listRecentHistory(actor, pressId, press.createdAt),
    getPressStatus(actor, pressId),
    listProblems(actor, pressId),
    getPressTimeZone(actor, pressId),
    listPressTagOuts(actor, pressId),
    listClearedTagOuts(actor, pressId),
    listDueForActor(actor, [pressId]),
    listPressInspections(actor, pressId, { limit: 5 }),
    // Without a chain key (misconfigured production) the page still shows, without the check.
    pressChainStatus(actor, pressId).catch((error: unknown) => {
      if (error instanceof SigningUnavailableError) return null;
      throw error;
    }),
    listTemplates(actor, press.shopId),
  ]);
  const startable = press.lifecycle === "retired" ? [] : templates.filter((t) => can(press.role, inspectionAction(t.signerRole, "perform")));
  const units = user.unitSystem;
  const asBuilt = evaluateAsBuilt(press, installed, units);
  const failing = asBuilt.checks.filter((c) => c.level === "fail");
  const motor = installed.find((c) => c.spec.kind === "motor");
  const canEdit = canEditPress(press.role) && press.lifecycle !== "retired";
  const rows: [string, string][] = [
    ["Frame", FRAME_TYPE_LABELS[press.frameType]],
    ["Lifecycle", LIFECYCLE_LABELS[press.lifecycle]],
    ["Rated force", press.ratedForceKn === null && asBuilt.ready ? `${show("force", asBuilt.result.reliefForceKn, units)} (as built)` : show("force", press.ratedForceKn, units)],
    ["Daylight", show("length", press.daylightMm, units)],
    ["Stroke", show("length", press.strokeMm, units)],
    ["Bed", press.bedWidthMm && press.bedDepthMm ? `${show("length", press.bedWidthMm, units)} × ${show("length", press.bedDepthMm, units)}` : "—"],
    ["Working pressure", show("pressure", press.workingPressureBar, units)],
    ["Relief setting", asBuilt.ready ? `${show("pressure", asBuilt.input.reliefBar ?? null, units)}${press.reliefPressureBar === null ? " (valve)" : ""}` : show("pressure", press.reliefPressureBar, units)],
    ["Hour meter", `${press.hourMeter} h`],
    ["Location", press.location ?? "—"],
  ];
  return (
    <>
      <PageTitle
        title={press.name}
        subtitle={press.notes ?? undefined}
        actions={
          <div className="flex flex-wrap gap-2">
            {canEdit ? (
              <>
                <Link href={`/presses/${pressId}/components/new`} className={buttonClass("primary")}>
                  Add a part
                </Link>
                <Link href={`/presses/${pressId}/edit`} className={buttonClass("secondary")}>
                  Edit press
                </Link>
              </>
            ) : null}
            {asBuilt.ready ? (
              <Link href={`/presses/${pressId}/gauge-card`} className={buttonClass("secondary")}>
                Gauge card
              </Link>
            ) : null}
            <Link href={`/presses/${pressId}/parts`} className={buttonClass("secondary")}>
              Parts list
            </Link>
          </div>
        }
      />
      <nav aria-label="Sections of this press" className="no-print -mx-4 mb-4 overflow-x-auto px-4 lg:hidden">
        <ul className="flex gap-2 whitespace-nowrap text-sm">
          {[
            ["#status", "Status"],
            ["#problems", "Problems"],
            ["#tag-out", "Tag-out"],
            ["#inspections", "Inspections"],
            ["#as-built", "As-built check"],
            ["#components", "Parts"],
            ["#service", "Service"],
            ["#photos", "Photos"],
            ["#history", "History"],
          ].map(([href, label]) => (
            <li key={href}>
              <a href={href} className="inline-flex min-h-10 items-center rounded-full bg-white px-3 ring-1 ring-steel-200">
                {label}
              </a>
            </li>
          ))}
        </ul>
      </nav>
      {failing.length > 0 ? (
        <p role="alert" className="mb-4 rounded-lg bg-fail-soft p-3 text-sm font-medium text-fail ring-1 ring-fail/30" data-testid="as-built-alert">
          The as-built check fails: {failing.map((c) => c.message).join(" ")}
        </p>
      ) : null}
      <div className="grid gap-4 lg:grid-cols-2 [&>*]:min-w-0">
        <div id="status" className="lg:col-span-2">
          <Card
            title="Status"
            actions={
              <div className="flex flex-wrap gap-2">
                {status.usable ? (
                  <Link href={`/bookings?press=${pressId}`} className={buttonClass("secondary")}>
                    Book
                  </Link>
                ) : null}
                <a href="#problems" className={buttonClass("secondary")}>
                  Report a problem
                </a>
                <Link href={`/presses/${pressId}/status-card`} className={buttonClass("secondary")}>
                  Status page and QR card
                </Link>
              </div>
            }
          >
            <div data-testid="press-status">
              <StatusBadge status={status} />
              <StatusReasons status={status} />
            </div>
          </Card>
        </div>
        <div id="tag-out">
          <Card title="Tag-out">
            <TagOutPanel pressId={pressId} open={tagOuts} cleared={cleared} canManage={can(press.role, "clearTagOut")} timeZone={shop.timeZone} />
          </Card>
        </div>
        <div id="inspections">
          <Card title="Inspections">
            <PressInspectionsPanel
              pressId={pressId}
              due={due.get(pressId) ?? []}
              recent={recent}
              chain={chain}
              templates={startable.map((t) => ({ value: t.id, label: `${t.name} (${CADENCE_LABELS[t.cadence]})` }))}
              timeZone={shop.timeZone}
            />
          </Card>
        </div>
        <Card title="Overview">
          <dl className="grid grid-cols-1 gap-x-6 gap-y-2 text-sm sm:grid-cols-2">
            {rows.map(([label, value]) => (
              <div key={label} className="flex justify-between gap-3 border-b border-steel-100 py-1">
                <dt className="text-steel-600">{label}</dt>
                <dd className="text-right font-mono">{value}</dd>
              </div>
            ))}
          </dl>
        </Card>
        <div id="as-built">
          <Card title="As-built check">
            <AsBuiltPanel asBuilt={asBuilt} units={units} motorKw={motor?.spec.kind === "motor" ? motor.spec.powerKw : null} />
          </Card>
        </div>
        <div id="components" className="lg:col-span-2">
          <Card title={`Parts (${installed.length})`}>
            <FreshSWR>
              <ComponentTable
                pressId={pressId}
                initial={installed.map(({ id, kind, label, spec, costCents, installedOn }) => ({ id, kind, label, spec, costCents, installedOn }))}
                units={units}
                currency={press.currency}
                canEdit={canEdit}
              />
            </FreshSWR>
          </Card>
        </div>
        <div id="service" className="lg:col-span-2">
          <PressService pressId={pressId} userId={user.id} role={press.role} retired={press.lifecycle === "retired"} units={units} currency={press.currency} />
        </div>
        <Card title="Hour meter">
          <p className="mb-3 text-sm text-steel-600">
            Last reading {press.hourMeter} h. Readings never go backwards, nor forward by more than the time that has passed.
          </p>
          {press.lifecycle !== "retired" ? <HourMeterForm action={recordHoursAction.bind(null, pressId)} current={press.hourMeter} /> : null}
          {press.lifecycle !== "retired" && can(press.role, "correctHours") ? <HourCorrectionForm action={correctHoursAction.bind(null, pressId)} /> : null}
        </Card>
        <div id="history">
          <Card title="History">
            <PressTimeline events={history} />
            {history.length >= HISTORY_SHOWN ? (
              <p className="mt-2 text-sm text-steel-600">
                The latest {HISTORY_SHOWN} events. Every part, removed ones included:{" "}
                <a className="text-oil-700 underline" href={`/api/presses/${pressId}/export?what=components`}>
                  all components (CSV)
                </a>
                ; every service: the service log above.
              </p>
            ) : null}
          </Card>
        </div>
        <div id="photos" className="lg:col-span-2">
          <PressPhotos pressId={pressId} userId={user.id} role={press.role} retired={press.lifecycle === "retired"} parts={installed.map((c) => ({ id: c.id, label: c.label }))} />
        </div>
        <div id="problems" className="lg:col-span-2">
          <Card title={`Problem reports (${problems.open.length} open)`}>
            <div className="grid gap-6 lg:grid-cols-2 [&>*]:min-w-0">
              <ProblemList pressId={pressId} problems={problems} canClose={can(press.role, "closeProblem")} timeZone={timeZone} />
              {press.lifecycle !== "retired" ? <ProblemForm pressId={pressId} action={reportProblemAction.bind(null, pressId)} /> : null}
            </div>
          </Card>
        </div>
        <div className="lg:col-span-2">
          <SafetyCautions compact />
        </div>
      </div>
    </>
  );
}
