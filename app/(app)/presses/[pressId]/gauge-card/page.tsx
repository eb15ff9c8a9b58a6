import type { Metadata } from "next";
import Link from "next/link";
import { GaugeCard } from "@/components/sizing/gauge-card";
import { PrintButton } from "@/components/sizing/print-button";
import { Card, PageTitle } from "@/components/ui/card";
import { orPageError, requireShopContext } from "@/lib/auth/current";
import { listComponents } from "@/lib/data/components";
import { getPress } from "@/lib/data/presses";

export const metadata: Metadata = { title: "Gauge card" };

/** The press's own gauge card: its installed cylinders and relief valve setting. */
export default async function PressGaugeCardPage({ params }: { params: Promise<{ pressId: string }> }) {
  const { pressId } = await params;
  const { user } = await requireShopContext();
  const actor = { userId: user.id };
  const press = await orPageError(getPress(actor, pressId));
  const parts = await listComponents(actor, pressId);
  const cylinders = parts.flatMap((p) => (p.spec.kind === "cylinder" ? [p.spec] : []));
  const dies = parts.flatMap((p) => (p.spec.kind === "die" && p.spec.maxForceKn !== undefined ? [{ name: p.label, maxForceKn: p.spec.maxForceKn }] : []));
  const relief = parts.flatMap((p) => (p.spec.kind === "relief-valve" ? [p.spec.settingBar] : []))[0] ?? press.reliefPressureBar;
  if (cylinders.length === 0 || !relief) {
    return (
      <>
        <PageTitle title="Gauge card" subtitle={press.name} />
        <Card>
          <p className="text-sm text-steel-700">Record the press&apos;s cylinders and relief valve first; the card is drawn from them.</p>
        </Card>
      </>
    );
  }
  return (
    <div className="print:p-0">
      <div className="no-print mb-4 flex flex-wrap items-center justify-between gap-3">
        <Link href={`/presses/${pressId}`} className="text-sm font-semibold text-oil-700 underline">
          ← {press.name}
        </Link>
        <PrintButton />
      </div>
      <GaugeCard name={press.name} cylinders={{ count: cylinders.length, boreMm: cylinders[0]!.boreMm }} reliefBar={relief} system={user.unitSystem} dies={dies} />
    </div>
  );
}
