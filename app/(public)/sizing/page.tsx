import type { Metadata } from "next";
import { ComingNext } from "@/components/ui/coming-next";

export const metadata: Metadata = { title: "Sizing" };

export default function SizingPage() {
  return (
    <div className="mx-auto max-w-6xl px-4 py-8">
      <ComingNext
        title="Sizing"
        intro="Size cylinders, pump and motor before you buy."
        points={[
          "Force at the dies in kN, tonnes-force and US tons; retract force on the annulus",
          "Advance, pressing and retract speeds and the time of one stroke, for single and two-stage pumps",
          "Motor power needed, line velocities, rod buckling, plate bending and every rating against the relief setting",
          "A printable gauge card turning the gauge reading into force at the dies",
        ]}
      />
    </div>
  );
}
