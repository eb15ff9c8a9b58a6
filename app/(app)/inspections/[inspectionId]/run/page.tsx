import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { RunChecklist } from "@/components/inspection/run-checklist";
import { PageTitle } from "@/components/ui/card";
import { orPageError, requireShopContext } from "@/lib/auth/current";
import { getInspection } from "@/lib/data/inspections";
import { CADENCE_LABELS } from "@/lib/inspections/labels";
import { reauthenticateForSigningAction } from "../../actions";

export const metadata: Metadata = { title: "Run inspection" };

export default async function RunInspectionPage({ params }: { params: Promise<{ inspectionId: string }> }) {
  const { inspectionId } = await params;
  const { user } = await requireShopContext();
  const inspection = await orPageError(getInspection({ userId: user.id }, inspectionId));
  if (inspection.signedAt || !inspection.mayPerform) redirect(`/inspections/${inspectionId}`);
  const initial = Object.fromEntries(inspection.items.map((i) => [i.key, { outcome: i.outcome, note: i.note, at: i.answeredAt?.getTime() ?? null }]));
  return (
    <div className="mx-auto w-full max-w-xl">
      <PageTitle
        title={inspection.templateName}
        subtitle={
          <>
            <Link href={`/presses/${inspection.pressId}`} className="underline">
              {inspection.pressName}
            </Link>{" "}
            · {CADENCE_LABELS[inspection.cadence]} · started by {inspection.startedByName ?? "—"}
          </>
        }
      />
      <RunChecklist
        inspectionId={inspection.id}
        pressId={inspection.pressId}
        items={inspection.items.map(({ outcome: _o, note: _n, answeredAt: _a, ...item }) => item)}
        initial={initial}
        maySign={inspection.maySign}
        signRule={inspection.signerRole === "member" ? "Any member of the shop may sign this check." : "Only an inspector or a manager may sign this checklist."}
        reauthAction={reauthenticateForSigningAction.bind(null, inspection.id)}
      />
    </div>
  );
}
