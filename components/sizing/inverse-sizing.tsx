"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { Field } from "@/components/ui/field";
import { INPUT_LIMITS, requiredFlowLpm, suggestBores, type BoreOption } from "@/lib/hydraulics";
import {
  displayUnit,
  formatInputValue,
  formatQuantity,
  parseDisplayInput,
  parseNumberInput,
  toBase,
  type UnitSystem,
} from "@/lib/units";

type ForceUnit = "kN" | "tf" | "shortTon";
const FORCE_UNITS: Record<ForceUnit, string> = { kN: "kN", tf: "t(f), metric tonnes", shortTon: "US tons (2000 lbf)" };

interface State {
  system: UnitSystem;
  /** Untouched: a unit switch brings that system's own round question. */
  pristine: boolean;
  force: string;
  forceUnit: ForceUnit;
  pressure: string;
  count: string;
  speed: string;
}

export interface BorePick {
  boreMm: number;
  count: number;
  pressureBar: number;
  /** Approach flow for the target speed on this bore, when a speed was given. */
  flowLpm?: number;
}

function initial(system: UnitSystem): State {
  // "What bore do I need for 30 t at 200 bar?" (or 30 US tons at 3000 psi), with a brisk approach.
  const metric = system === "metric";
  return {
    system,
    pristine: true,
    force: "30",
    forceUnit: metric ? "tf" : "shortTon",
    pressure: metric ? "200" : "3000",
    count: "1",
    speed: metric ? "50" : "2",
  };
}

function convert(state: State, to: UnitSystem): State {
  if (state.pristine) return initial(to);
  const re = (kind: "pressure" | "speed", text: string): string => {
    const si = parseDisplayInput(kind, text, state.system);
    return si === null ? text : formatInputValue(kind, si, to);
  };
  return { ...state, system: to, pressure: re("pressure", state.pressure), speed: re("speed", state.speed) };
}

const within = (v: number | null, [lo, hi]: readonly [number, number]): v is number => v !== null && v >= lo && v <= hi;

/** Target force and pressure → the bore it takes, with the nearest standard bores either side. */
export function InverseSizing({ system, onUse }: { system: UnitSystem; onUse: (pick: BorePick) => void }) {
  const [state, setState] = useState(() => initial(system));
  // Follow a unit switch by rewriting what was typed (React's "adjust state while rendering").
  if (state.system !== system) setState(convert(state, system));
  const set = (patch: Partial<State>) => setState((s) => ({ ...s, ...patch, pristine: false }));

  const forceValue = parseNumberInput(state.force);
  const forceKn = forceValue !== null && forceValue > 0 ? toBase("force", forceValue, state.forceUnit) : null;
  const pressureBar = parseDisplayInput("pressure", state.pressure, system);
  const count = parseNumberInput(state.count);
  const speedText = state.speed.trim();
  const speed = speedText ? parseDisplayInput("speed", speedText, system) : null;
  const errors = {
    force: forceKn === null || forceKn > 1e6 ? "Enter a force above zero." : undefined,
    pressure: within(pressureBar, INPUT_LIMITS.pressureBar) ? undefined : "Enter a pressure within the gauge's range (0.1–2000 bar).",
    count: within(count, INPUT_LIMITS.cylinderCount) && Number.isInteger(count) ? undefined : "Enter 1 to 8 cylinders.",
    speed: speedText && !(speed !== null && speed > 0) ? "Enter a speed above zero, or leave it blank." : undefined,
  };
  const valid = !errors.force && !errors.pressure && !errors.count && forceKn !== null && pressureBar !== null && count !== null;
  const suggestion = valid ? suggestBores({ forceKn, pressureBar, count }) : null;
  const q = (kind: "length" | "pressure" | "force" | "flow", v: number): string => formatQuantity(kind, v, system);

  const option = (o: BoreOption | undefined, role: string) => {
    if (!o || !valid) return null;
    const flow = speed !== null && speed > 0 ? requiredFlowLpm(speed, o.boreMm, count) : undefined;
    return (
      <li key={`${o.series}-${o.label}`} className="flex flex-wrap items-center justify-between gap-2 rounded-md bg-steel-50 p-3 ring-1 ring-steel-100">
        <div className="min-w-0 text-sm">
          <p className="font-semibold text-ink">
            {o.label} <span className="font-normal text-steel-600">({o.series}, {role})</span>
          </p>
          <p className="text-steel-700">
            {q("force", o.forceKn)} at {q("pressure", pressureBar)}; needs {q("pressure", o.pressureForTargetBar)} for the target
            {flow !== undefined ? `; ${q("flow", flow)} for the speed` : ""}
          </p>
        </div>
        <Button type="button" variant="secondary" onClick={() => onUse({ boreMm: o.boreMm, count, pressureBar, ...(flow !== undefined ? { flowLpm: flow } : {}) })}>
          Use {o.label}
        </Button>
      </li>
    );
  };

  return (
    <Card title="What bore do I need?">
      <div className="grid grid-cols-1 gap-3 sm:grid-cols-2">
        <Field name="inv-force" id="inverse-force" label="Target force" inputMode="decimal" value={state.force} onChange={(e) => set({ force: e.target.value })} errors={errors.force ? [errors.force] : undefined} />
        <div className="flex flex-col gap-1">
          <label htmlFor="inverse-force-unit" className="text-sm font-medium text-steel-800">Force unit</label>
          <select id="inverse-force-unit" value={state.forceUnit} onChange={(e) => set({ forceUnit: (Object.keys(FORCE_UNITS) as ForceUnit[]).find((u) => u === e.target.value) ?? "kN" })} className="min-h-11 rounded-md border border-steel-300 bg-white px-3 text-base">
            {(Object.keys(FORCE_UNITS) as ForceUnit[]).map((u) => (
              <option key={u} value={u}>{FORCE_UNITS[u]}</option>
            ))}
          </select>
        </div>
        <Field name="inv-pressure" id="inverse-pressure" label={`At pressure (${displayUnit("pressure", system).symbol})`} inputMode="decimal" value={state.pressure} onChange={(e) => set({ pressure: e.target.value })} errors={errors.pressure ? [errors.pressure] : undefined} />
        <Field name="inv-count" id="inverse-count" label="Cylinders in parallel" inputMode="numeric" value={state.count} onChange={(e) => set({ count: e.target.value })} errors={errors.count ? [errors.count] : undefined} />
        <Field name="inv-speed" id="inverse-speed" label={`Approach speed wanted (${displayUnit("speed", system).symbol})`} hint="Optional: gives the pump flow each bore needs." inputMode="decimal" value={state.speed} onChange={(e) => set({ speed: e.target.value })} errors={errors.speed ? [errors.speed] : undefined} />
      </div>
      {suggestion ? (
        <div className="mt-4">
          <p className="text-sm text-steel-700">
            Bore needed: <strong className="font-mono text-lg text-ink" data-testid="required-bore">{q("length", suggestion.requiredBoreMm)}</strong>
            {count !== null && count > 1 ? ` each, for ${count} cylinders` : ""}
          </p>
          <ul className="mt-3 flex flex-col gap-2">
            {(system === "metric" ? [suggestion.metric, suggestion.inch] : [suggestion.inch, suggestion.metric]).flatMap((series) => [
              option(series.atOrAbove, "meets the target"),
              option(series.below, "falls short"),
            ])}
          </ul>
          <p className="mt-3 text-xs text-steel-600">
            Standard bores: the ISO 3320 metric series and common inch sizes of tie-rod and welded cylinders (both from memory; check the maker&apos;s list).
          </p>
        </div>
      ) : null}
    </Card>
  );
}
