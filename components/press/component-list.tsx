import Link from "next/link";
import type { ComponentRow } from "@/lib/data/components";
import { KIND_LABELS } from "@/lib/press/component-fields";
import { formatMoney } from "@/lib/press/parts-list";
import { specSummary } from "@/lib/press/spec-summary";
import type { UnitSystem } from "@/lib/units";

type Props = { pressId: string; parts: ComponentRow[]; units: UnitSystem; currency: string; canEdit: boolean };

/** The installed parts, grouped by kind, with their figures and (for managers) what can be done. */
export function ComponentList({ pressId, parts, units, currency, canEdit }: Props) {
  if (parts.length === 0) return <p className="text-sm text-steel-600">No parts recorded yet.</p>;
  return (
    <ul className="divide-y divide-steel-100" data-testid="component-list">
      {parts.map((part) => (
        <li key={part.id} className="flex flex-col gap-2 py-3 sm:flex-row sm:items-start sm:justify-between">
          <div className="min-w-0">
            <p className="font-medium">
              {part.label} <span className="text-xs font-normal text-steel-500">{KIND_LABELS[part.kind]}</span>
            </p>
            <p className="text-sm text-steel-700">{specSummary(part.spec, units)}</p>
            <p className="text-xs text-steel-500">
              {[part.maker, part.partNumber, part.supplier, part.costCents !== null ? formatMoney(part.costCents, currency) : null, part.installedOn ? `installed ${part.installedOn}` : null]
                .filter(Boolean)
                .join(" · ")}
            </p>
          </div>
          {canEdit ? (
            <div className="flex shrink-0 gap-1 text-sm">
              <Link className="rounded px-2 py-1 text-oil-700 underline" href={`/presses/${pressId}/components/${part.id}/edit`}>
                Edit
              </Link>
              <Link className="rounded px-2 py-1 text-oil-700 underline" href={`/presses/${pressId}/components/${part.id}/replace`} aria-label={`Replace ${part.label}`}>
                Replace
              </Link>
              <Link className="rounded px-2 py-1 text-oil-700 underline" href={`/presses/${pressId}/components/${part.id}/remove`}>
                Remove
              </Link>
            </div>
          ) : null}
        </li>
      ))}
    </ul>
  );
}
