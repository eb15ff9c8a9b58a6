import type { Metadata } from "next";
import { ComingNext } from "@/components/ui/coming-next";

export const metadata: Metadata = { title: "Inspections" };

export default function InspectionsPage() {
  return (
    <ComingNext
      title="Inspections"
      intro="Checklists run at the press and signed off by an inspector."
      points={[
        "Pre-use, periodic and after-modification checklists, with critical items marked",
        "Pass, fail or not applicable for each item, with notes and photos, on a phone",
        "Sign-off by an inspector; a signed record never changes and carries a tamper-evident seal",
        "Inspections falling due on a cadence, and a printable record",
      ]}
    />
  );
}
