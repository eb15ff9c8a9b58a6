import Link from "next/link";
import type { PressSummary } from "@/lib/data/presses";
import { FRAME_TYPE_LABELS, LIFECYCLE_LABELS } from "@/lib/press-labels";
import { showQuantity as show } from "@/components/ui/quantity";
import type { PressStatus } from "@/lib/status";
import type { UnitSystem } from "@/lib/units";
import { StatusBadge } from "@/components/ui/status-badge";

export function PressCard({ press, units, status }: { press: PressSummary; units: UnitSystem; status: PressStatus | undefined }) {
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
      {status ? (
        <div className="mt-3" data-testid="press-card-status">
          <StatusBadge status={status} />
          {status.reasons[0] ? <p className="mt-1 line-clamp-2 text-xs text-steel-700">{status.reasons.join(" ")}</p> : null}
        </div>
      ) : null}
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
