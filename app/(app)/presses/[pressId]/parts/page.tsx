import type { Metadata } from "next";
import Link from "next/link";
import { buttonClass } from "@/components/ui/button";
import { Card, PageTitle } from "@/components/ui/card";
import { orPageError, requireShopContext } from "@/lib/auth/current";
import { listComponents } from "@/lib/data/components";
import { getPress } from "@/lib/data/presses";
import { KIND_LABELS } from "@/lib/press/component-fields";
import { formatMoney, partsTotals } from "@/lib/press/parts-list";
import { ScrollRegion } from "@/components/ui/scroll-region";

export const metadata: Metadata = { title: "Parts list" };

export default async function PartsListPage({ params }: { params: Promise<{ pressId: string }> }) {
  const { pressId } = await params;
  const { user } = await requireShopContext();
  const actor = { userId: user.id };
  const press = await orPageError(getPress(actor, pressId));
  const parts = await listComponents(actor, pressId);
  const totals = partsTotals(parts);
  const money = (cents: number | null) => formatMoney(cents, press.currency);
  return (
    <>
      <PageTitle
        title="Parts list"
        subtitle={<Link href={`/presses/${pressId}`} className="underline">{press.name}</Link>}
        actions={
          <div className="flex flex-wrap gap-2">
            <a href={`/api/presses/${pressId}/export?what=parts`} className={buttonClass("secondary")}>
              Parts list CSV
            </a>
            <a href={`/api/presses/${pressId}/export?what=components`} className={buttonClass("secondary")}>
              All components CSV
            </a>
          </div>
        }
      />
      <dl className="mb-4 grid grid-cols-2 gap-3 sm:grid-cols-4" data-testid="parts-totals">
        {[
          ["Total", money(totals.totalCents)],
          ["Bought", money(totals.boughtCents)],
          ["Still to buy", `${money(totals.toBuyCents)} (${totals.toBuyCount})`],
          ["Without a price", String(totals.unpricedCount)],
        ].map(([label, value]) => (
          <div key={label} className="rounded-lg bg-white p-3 ring-1 ring-steel-200">
            <dt className="text-xs text-steel-500">{label}</dt>
            <dd className="font-mono text-lg font-semibold">{value}</dd>
          </div>
        ))}
      </dl>
      <Card>
        <ScrollRegion label="Parts list">
          <table className="w-full min-w-[36rem] text-left text-sm">
            <thead className="border-b border-steel-200 text-xs uppercase tracking-wide text-steel-500">
              <tr>
                <th className="py-2 pr-3">Part</th>
                <th className="py-2 pr-3">Maker / number</th>
                <th className="py-2 pr-3">Supplier</th>
                <th className="py-2 pr-3 text-right">Cost</th>
                <th className="py-2">Bought</th>
              </tr>
            </thead>
            <tbody>
              {parts.map((p) => (
                <tr key={p.id} className={`border-b border-steel-100 ${p.purchased ? "" : "bg-oil-50"}`}>
                  <td className="py-2 pr-3">
                    {p.label} <span className="text-xs text-steel-500">{KIND_LABELS[p.kind]}</span>
                  </td>
                  <td className="py-2 pr-3">{[p.maker, p.partNumber].filter(Boolean).join(" ") || "—"}</td>
                  <td className="py-2 pr-3">{p.supplier ?? "—"}</td>
                  <td className="py-2 pr-3 text-right font-mono">{money(p.costCents)}</td>
                  <td className="py-2">{p.purchased ? "Yes" : <strong className="text-oil-700">To buy</strong>}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </ScrollRegion>
      </Card>
    </>
  );
}
