import Link from "next/link";
import type { PressSummary } from "@/lib/data/presses";
import { FRAME_TYPE_LABELS, LIFECYCLE_LABELS } from "@/lib/press-labels";
import { showQuantity as show } from "@/components/ui/quantity";
import type { UnitSystem } from "@/lib/units";

export function PressCard({ press, units }: { press: PressSummary; units: UnitSystem }) {
  return (
    <Link
      href={`/presses/${press.id}`}
      className="block rounded-lg bg-white p-4 shadow-sm ring-1 ring-steel-200 transition hover:ring-oil-400"
    >
      <div className="flex items-start justify-between gap-2">
        <h3 className="font-semibold text-ink">{press.name}</h3>
        <span className="shrink-0 rounded bg-steel-100 px-2 py-0.5 text-xs font-medium text-steel-700">
          {LIFECYCLE_LABELS[press.lifecycle]}
        </span>
      </div>
      <p className="mt-1 text-sm text-steel-600">
        {FRAME_TYPE_LABELS[press.frameType]}
        {press.location ? ` · ${press.location}` : ""}
      </p>
      <dl className="mt-3 grid grid-cols-3 gap-2 text-sm">
        <Figure label="Rated" value={show("force", press.ratedForceKn, units)} />
        <Figure label="Stroke" value={show("length", press.strokeMm, units)} />
        <Figure label="Relief" value={show("pressure", press.reliefPressureBar, units)} />
      </dl>
      <p className="mt-3 text-xs text-steel-500">Status shows here once inspections and service plans are recorded.</p>
    </Link>
  );
}

function Figure({ label, value }: { label: string; value: string }) {
  return (
    <div>
      <dt className="text-xs text-steel-500">{label}</dt>
      <dd className="font-mono text-sm text-ink">{value}</dd>
    </div>
  );
}
