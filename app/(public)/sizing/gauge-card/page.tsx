import type { Metadata } from "next";
import Link from "next/link";
import { GaugeCard } from "@/components/sizing/gauge-card";
import { PrintButton } from "@/components/sizing/print-button";
import { buttonClass } from "@/components/ui/button";
import { Card, PageTitle } from "@/components/ui/card";
import { fieldErrorsOf, allMessages } from "@/lib/validation/field-errors";
import { gaugeCardQuerySchema } from "@/lib/validation/gauge-card";

export const metadata: Metadata = { title: "Gauge card" };

type SearchParams = Promise<Record<string, string | string[] | undefined>>;

export default async function GaugeCardPage({ searchParams }: { searchParams: SearchParams }) {
  const parsed = gaugeCardQuerySchema.safeParse(await searchParams);
  if (!parsed.success) {
    const messages = allMessages(fieldErrorsOf(parsed.error.issues));
    return (
      <div className="mx-auto max-w-3xl px-4 py-8">
        <PageTitle title="Gauge card" />
        <Card title="This link does not describe a press">
          <ul className="list-disc space-y-1 pl-5 text-sm text-fail">
            {messages.map((m) => (
              <li key={m}>{m}</li>
            ))}
          </ul>
          <p className="mt-3 text-sm text-steel-700">Open the gauge card from the sizing calculator, which fills these in.</p>
          <Link href="/sizing" className={buttonClass("secondary", "mt-4")}>
            Back to sizing
          </Link>
        </Card>
      </div>
    );
  }
  const q = parsed.data;
  return (
    <div className="mx-auto max-w-3xl px-4 py-6 print:max-w-none print:p-0">
      <div className="no-print mb-4 flex flex-wrap items-center justify-between gap-3">
        <Link href="/sizing" className="text-sm font-semibold text-oil-700 underline">
          ← Back to sizing
        </Link>
        <PrintButton />
      </div>
      <GaugeCard name={q.name} cylinders={{ count: q.count, boreMm: q.bore }} reliefBar={q.relief} system={q.units} />
    </div>
  );
}
