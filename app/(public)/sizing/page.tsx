import type { Metadata } from "next";
import { VisitorSizingCalculator } from "@/components/sizing/visitor-sizing-calculator";
import { PageTitle } from "@/components/ui/card";

export const metadata: Metadata = {
  title: "Sizing",
  description: "Size the cylinders, pump and motor of a hydraulic forging press: force, speeds, power and sourced checks.",
};

/** Prerendered: the link's inputs and the visitor's account are read in the browser. */
export default function SizingPage() {
  return (
    <div className="mx-auto max-w-6xl px-4 py-8">
      <PageTitle
        title="Sizing"
        subtitle="Cylinders, pump and motor before you buy. Results update as you type and are worked out in your browser."
      />
      <VisitorSizingCalculator />
    </div>
  );
}
