import type { Metadata } from "next";
import { Suspense } from "react";
import { GaugeCardFromLink } from "@/components/sizing/gauge-card-from-link";

export const metadata: Metadata = { title: "Gauge card" };

/** Prerendered: the card is drawn in the browser from its link's query. */
export default function GaugeCardPage() {
  return (
    <Suspense fallback={<p className="mx-auto max-w-3xl px-4 py-8 text-sm text-steel-600">Drawing the gauge card…</p>}>
      <GaugeCardFromLink />
    </Suspense>
  );
}
