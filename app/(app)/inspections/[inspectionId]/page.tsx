import type { Metadata } from "next";
import Link from "next/link";
import { InspectionRecord } from "@/components/inspection/inspection-record";
import { buttonClass } from "@/components/ui/button";
import { Card, PageTitle } from "@/components/ui/card";
import { orPageError, requireShopContext } from "@/lib/auth/current";
import { getInspection } from "@/lib/data/inspections";

export const metadata: Metadata = { title: "Inspection" };

export default async function InspectionPage({ params }: { params: Promise<{ inspectionId: string }> }) {
  const { inspectionId } = await params;
  const { user, shop } = await requireShopContext();
  const inspection = await orPageError(getInspection({ userId: user.id }, inspectionId));
  return (
    <>
      <PageTitle
        title={inspection.templateName}
        subtitle={inspection.signedAt ? "Signed: this record can no longer change." : "In progress"}
        actions={
          <div className="flex flex-wrap gap-2">
            {inspection.mayPerform ? (
              <Link href={`/inspections/${inspection.id}/run`} className={buttonClass("primary")}>
                Continue the checklist
              </Link>
            ) : null}
            {inspection.signedAt ? (
              <Link href={`/inspections/${inspection.id}/print`} className={buttonClass("secondary")}>
                Print view
              </Link>
            ) : null}
            <Link href={`/presses/${inspection.pressId}`} className={buttonClass("secondary")}>
              {inspection.pressName}
            </Link>
          </div>
        }
      />
      <Card>
        <InspectionRecord inspection={inspection} timeZone={shop.timeZone} />
      </Card>
    </>
  );
}
