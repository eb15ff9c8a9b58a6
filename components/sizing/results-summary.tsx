import { sweptVolumeL } from "@/lib/hydraulics";
import type { SizingInput, SizingResult } from "@/lib/hydraulics/types";
import { formatQuantity, type QuantityKind, type UnitSystem } from "@/lib/units";
import { forceInThree } from "./format";

function Tile({ label, value, sub }: { label: string; value: string; sub?: string }) {
  return (
    <div className="min-w-0 rounded-md bg-steel-50 p-3 ring-1 ring-steel-100">
      <dt className="text-xs font-medium text-steel-600">{label}</dt>
      <dd className="mt-0.5 font-mono text-lg font-semibold text-ink">{value}</dd>
      {sub ? <dd className="text-xs text-steel-600">{sub}</dd> : null}
    </div>
  );
}

/** A force in all three units, the system's own first; each tagged so tests can find a unit. */
function ForceLine({ kN, system, big }: { kN: number; system: UnitSystem; big?: boolean }) {
  const [main, ...others] = forceInThree(kN, system);
  return (
    <>
      <dd className={big ? "font-mono text-2xl font-semibold" : "mt-0.5 font-mono text-lg font-semibold text-ink"}>
        <span data-force-unit={main?.unit}>{main?.text}</span>
      </dd>
      <dd className={big ? "font-mono text-sm text-steel-200" : "text-xs text-steel-600"}>
        {others.map((o, i) => (
          <span key={o.unit}>
            {i > 0 ? " · " : ""}
            <span data-force-unit={o.unit}>{o.text}</span>
          </span>
        ))}
      </dd>
    </>
  );
}

/** The headline figures; every force also in the two other common units. */
export function ResultsSummary({ input, result, system }: { input: SizingInput; result: SizingResult; system: UnitSystem }) {
  const q = (kind: QuantityKind, value: number): string => formatQuantity(kind, value, system);
  return (
    <div className="flex flex-col gap-3">
      <dl className="grid grid-cols-1 gap-2 sm:grid-cols-2">
        <div className="rounded-md bg-steel-900 p-3 text-white sm:col-span-2" data-testid="working-force">
          <dt className="text-xs font-medium text-steel-300">Force at the dies, working pressure {q("pressure", input.pressureBar)}</dt>
          <ForceLine kN={result.forceKn} system={system} big />
        </div>
        <div className="min-w-0 rounded-md bg-steel-50 p-3 ring-1 ring-steel-100" data-testid="relief-force">
          <dt className="text-xs font-medium text-steel-600">Rated force, at relief {q("pressure", result.reliefBar)}</dt>
          <ForceLine kN={result.reliefForceKn} system={system} />
        </div>
        <Tile label="Retract force (annulus)" value={q("force", result.retractForceKn)} />
      </dl>
      <dl className="grid grid-cols-2 gap-2 sm:grid-cols-3">
        <Tile label="Advance" value={q("speed", result.advanceSpeedMmS)} />
        <Tile label="Pressing" value={q("speed", result.pressingSpeedMmS)} />
        <Tile label="Retract" value={q("speed", result.retractSpeedMmS)} />
        <Tile label="One cycle" value={result.cycleTimeS === undefined ? "—" : `${result.cycleTimeS.toFixed(1)} s`} />
        <Tile label="Oil to fill the stroke" value={q("volume", sweptVolumeL(result.capAreaMm2, input.cylinders.strokeMm))} />
        <Tile label="Approach power" value={q("power", result.approachPowerKw)} />
        <Tile label="Pressing power" value={q("power", result.pressingPowerKw)} />
        <Tile label="Motor needed" value={q("power", result.motorRequiredKw)} sub={`${result.governingStage} stage governs`} />
        <Tile
          label="Motor holds up to"
          value={result.maxPressureForMotorBar === undefined ? "—" : q("pressure", result.maxPressureForMotorBar)}
          sub="at the pressing flow"
        />
      </dl>
    </div>
  );
}
