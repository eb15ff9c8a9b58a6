import { CheckList, OverallVerdict } from "@/components/sizing/check-list";
import type { AsBuilt } from "@/lib/press/as-built";
import { formatQuantity, type QuantityKind, type UnitSystem } from "@/lib/units";

/** Derived figures of the installed parts and the same sourced checks as the sizing page. */
export function AsBuiltPanel({ asBuilt, units, motorKw }: { asBuilt: AsBuilt; units: UnitSystem; motorKw: number | null }) {
  if (!asBuilt.ready) {
    return (
      <div className="flex flex-col gap-3">
        <p className="text-sm text-steel-700">
          The as-built check needs {asBuilt.missing.join(", ")}. Add the parts and it runs by itself.
        </p>
        {asBuilt.checks.length > 0 ? <CheckList checks={asBuilt.checks} /> : null}
      </div>
    );
  }
  const r = asBuilt.result;
  const q = (kind: QuantityKind, v: number) => formatQuantity(kind, v, units, { significant: 3 });
  const figures: [string, string][] = [
    ["Force at working pressure", `${q("force", r.forceKn)} · ${formatQuantity("force", r.forceKn, units, { unit: units === "metric" ? "tf" : "kN" })}`],
    ["Force at relief (rating)", q("force", r.reliefForceKn)],
    ["Retract force", q("force", r.retractForceKn)],
    ["Advance / pressing / retract", `${q("speed", r.advanceSpeedMmS)} / ${q("speed", r.pressingSpeedMmS)} / ${q("speed", r.retractSpeedMmS)}`],
    ["Motor needed", q("power", r.motorRequiredKw)],
    ["Motor fitted", motorKw === null ? "none recorded" : `${q("power", motorKw)} (${motorKw >= r.motorRequiredKw ? "+" : ""}${Math.round(((motorKw - r.motorRequiredKw) / r.motorRequiredKw) * 100)} % margin)`],
  ];
  return (
    <div className="flex flex-col gap-4">
      <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-2" data-testid="as-built-figures">
        {figures.map(([label, value]) => (
          <div key={label} className="flex justify-between gap-3 border-b border-steel-100 py-1">
            <dt className="text-steel-600">{label}</dt>
            <dd className="text-right font-mono">{value}</dd>
          </div>
        ))}
      </dl>
      <OverallVerdict overall={asBuilt.overall} missing={asBuilt.missingChecks} />
      <CheckList checks={asBuilt.checks} />
    </div>
  );
}
