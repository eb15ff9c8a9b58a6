"use client";

import Link from "next/link";
import { useSearchParams } from "next/navigation";
import { buttonClass } from "@/components/ui/button";
import { Card, PageTitle } from "@/components/ui/card";
import { allMessages, fieldErrorsOf } from "@/lib/validation/field-errors";
import { gaugeCardQuerySchema } from "@/lib/validation/gauge-card";
import { GaugeCard } from "./gauge-card";
import { PrintButton } from "./print-button";

/** The query as the server used to see it: a repeated key is an array (and refused by the schema). */
function queryRecord(params: URLSearchParams): Record<string, string | string[]> {
  const record: Record<string, string | string[]> = {};
  for (const key of new Set(params.keys())) {
    const values = params.getAll(key);
    record[key] = values.length === 1 ? values[0]! : values;
  }
  return record;
}

/** The printable gauge card described by its link (made by gaugeCardHref); read in the browser. */
export function GaugeCardFromLink() {
  const parsed = gaugeCardQuerySchema.safeParse(queryRecord(useSearchParams()));
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
