import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { InspectionRecord } from "@/components/inspection/inspection-record";
import { PrintButton } from "@/components/sizing/print-button";
import { orPageError, requireShopContext } from "@/lib/auth/current";
import { getInspection } from "@/lib/data/inspections";

export const metadata: Metadata = { title: "Inspection record" };

/** One clean page per signed inspection: items, notes, signer, time and chain value. */
export default async function PrintInspectionPage({ params }: { params: Promise<{ inspectionId: string }> }) {
  const { inspectionId } = await params;
  const { user, shop } = await requireShopContext();
  const inspection = await orPageError(getInspection({ userId: user.id }, inspectionId));
  if (!inspection.signedAt) notFound();
  return (
    <div className="mx-auto max-w-3xl bg-white p-6 ring-1 ring-steel-200 print:max-w-none print:p-0 print:ring-0 [print-color-adjust:exact]">
      <div className="no-print mb-4 flex items-center justify-between gap-3">
        <Link href={`/inspections/${inspection.id}`} className="text-sm font-semibold text-oil-700 underline">
          ← Back to the inspection
        </Link>
        <PrintButton />
      </div>
      <header className="mb-3 border-b-2 border-ink pb-2">
        <p className="text-xs uppercase tracking-wide text-steel-600">{shop.name} · inspection record</p>
        <h1 className="text-xl font-semibold">
          {inspection.pressName}: {inspection.templateName}
        </h1>
      </header>
      <InspectionRecord inspection={inspection} timeZone={shop.timeZone} />
      <p className="mt-4 text-xs text-steel-600">
        This record was signed in Presswright and is read-only. Its chain value lets anyone with the shop&apos;s verifier check that nothing in it changed. A home-built press
        is not certified: defer to local codes, component makers&apos; ratings and a licensed engineer.
      </p>
    </div>
  );
}
