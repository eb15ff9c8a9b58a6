import type { Metadata } from "next";
import { Card, PageTitle } from "@/components/ui/card";
import { orPageError, requireShopContext } from "@/lib/auth/current";
import { getPress } from "@/lib/data/presses";
import { FRAME_TYPE_LABELS, LIFECYCLE_LABELS } from "@/lib/press-labels";
import { showQuantity as show } from "@/components/ui/quantity";

export const metadata: Metadata = { title: "Press" };

export default async function PressPage({ params }: { params: Promise<{ pressId: string }> }) {
  const { pressId } = await params;
  const { user } = await requireShopContext();
  const press = await orPageError(getPress({ userId: user.id }, pressId));
  const units = user.unitSystem;
  const rows: [string, string][] = [
    ["Frame", FRAME_TYPE_LABELS[press.frameType]],
    ["Lifecycle", LIFECYCLE_LABELS[press.lifecycle]],
    ["Rated force", show("force", press.ratedForceKn, units)],
    ["Daylight", show("length", press.daylightMm, units)],
    ["Stroke", show("length", press.strokeMm, units)],
    ["Bed", press.bedWidthMm && press.bedDepthMm ? `${show("length", press.bedWidthMm, units)} × ${show("length", press.bedDepthMm, units)}` : "—"],
    ["Working pressure", show("pressure", press.workingPressureBar, units)],
    ["Relief setting", show("pressure", press.reliefPressureBar, units)],
    ["Hour meter", `${press.hourMeter.toFixed(1)} h`],
    ["Location", press.location ?? "—"],
  ];
  return (
    <>
      <PageTitle title={press.name} subtitle={press.notes ?? undefined} />
      <div className="grid gap-4 lg:grid-cols-2">
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
        <Card title="Components, service log and inspections">
          <p className="text-sm text-steel-600">
            The component list with its history, the as-built check, the service log, inspections, photos and bookings
            of this press will be recorded here.
          </p>
        </Card>
      </div>
    </>
  );
}
