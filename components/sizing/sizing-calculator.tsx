"use client";

import dynamic from "next/dynamic";
import { useMemo, useState } from "react";
import { Card } from "@/components/ui/card";
import { evaluateSizing, SizingInputError } from "@/lib/hydraulics";
import type { SizingInput, SizingResult } from "@/lib/hydraulics/types";
import type { UnitSystem } from "@/lib/units";
import { CheckList, OverallVerdict } from "./check-list";
import { checkForm } from "./form-errors";
import { formFromInput } from "./form-from-input";
import { applySi, convertForm, defaultForm, type FieldId, type FormState } from "./form-model";
import { InverseSizing, type BorePick } from "./inverse-sizing";
import { PhoneSummary } from "./phone-summary";
import { PressSchematic } from "./press-schematic";
import { ResultsSummary } from "./results-summary";
import { SafetyCautions } from "./safety-cautions";
import { SavePlan, type SaveContext } from "./save-plan";
import { SizingForm, type FormAction } from "./sizing-form";
import { UnitSwitch } from "./unit-switch";
import { useUnitSystem } from "./use-unit-system";

// The chart library is loaded after the calculator is on screen, keeping the first load small.
const SizingCharts = dynamic(() => import("./sizing-charts"), {
  ssr: false,
  loading: () => <p className="min-h-96 text-sm text-steel-500">Loading the plots…</p>,
});

type Evaluation = { input: SizingInput; result: SizingResult };

function reduce(form: FormState, action: FormAction): FormState {
  switch (action.type) {
    case "value":
      return { ...form, pristine: false, values: { ...form.values, [action.id]: action.text } };
    case "choice":
      return { ...form, pristine: false, choices: { ...form.choices, ...action.choice } };
    case "block":
      return { ...form, pristine: false, blocks: { ...form.blocks, [action.id]: action.on } };
  }
}

function evaluate(input: SizingInput, system: UnitSystem): Evaluation | null {
  try {
    return { input, result: evaluateSizing(input, { system }) };
  } catch (error) {
    if (error instanceof SizingInputError) return null; // shown as field errors by the schema
    throw error;
  }
}

/** The live calculator: every keystroke re-runs the engine in the browser; nothing is sent anywhere. */
export function SizingCalculator({
  accountSystem,
  save,
  initial = null,
}: {
  accountSystem: UnitSystem | null;
  save: SaveContext;
  /** Inputs carried in the link (e.g. back from signing in), instead of the invented defaults. */
  initial?: { input: SizingInput; name: string } | null;
}) {
  const [system, setSystem] = useUnitSystem(accountSystem);
  const [form, setForm] = useState(() =>
    initial ? formFromInput(initial.input, accountSystem ?? "metric") : defaultForm(accountSystem ?? "metric"),
  );
  // A unit switch rewrites what was typed in the new units (React's "adjust state while rendering").
  // The remembered system arriving after hydration finds the form untouched: use its own defaults.
  if (form.system !== system) setForm(form.pristine ? defaultForm(system) : convertForm(form, system));
  const [mode, setMode] = useState<"design" | "inverse">("design");
  const [name, setName] = useState(initial?.name ?? "");

  const check = useMemo(() => checkForm(form), [form]);
  const current = useMemo(() => (check.ok ? evaluate(check.input, form.system) : null), [check, form.system]);
  // While a field is half-typed, keep showing the last figures that were valid, marked as such.
  const [lastGood, setLastGood] = useState<Evaluation | null>(current);
  if (current && current !== lastGood) setLastGood(current);
  const shown = current ?? lastGood;
  // Re-run the old input so its check messages follow a unit switch too.
  const shownResult = current ? current.result : lastGood ? evaluate(lastGood.input, system)?.result : undefined;

  const dispatch = (action: FormAction) => setForm((f) => reduce(f, action));
  const pickBore = (pick: BorePick) => {
    const si: Partial<Record<FieldId, number>> = { boreMm: pick.boreMm, count: pick.count, pressureBar: pick.pressureBar };
    if (pick.flowLpm !== undefined) si[form.choices.pumpKind === "single" ? "flowLpm" : "approachFlowLpm"] = pick.flowLpm;
    setForm((f) => applySi(f, si));
    setMode("design");
  };

  const tab = (value: typeof mode, label: string) => (
    <button
      type="button"
      aria-pressed={mode === value}
      onClick={() => setMode(value)}
      className="min-h-10 rounded px-3 text-sm font-semibold text-steel-700 aria-pressed:bg-white aria-pressed:text-ink aria-pressed:shadow-sm"
    >
      {label}
    </button>
  );

  return (
    <div>
      <div className="mb-4 flex flex-wrap items-center justify-between gap-3">
        <div className="inline-flex rounded-md bg-steel-100 p-1 ring-1 ring-steel-200" role="group" aria-label="Mode">
          {tab("design", "Check a design")}
          {tab("inverse", "Find a bore")}
        </div>
        <UnitSwitch
          value={system}
          onChange={(next) => {
            // A switch by hand converts the same press; it never swaps in other defaults.
            setForm((f) => ({ ...f, pristine: false }));
            setSystem(next);
          }}
        />
      </div>
      <div className="grid gap-6 lg:grid-cols-[minmax(0,5fr)_minmax(0,7fr)]">
        <div className="min-w-0">
          {mode === "design" ? (
            <SizingForm form={form} errors={check.errors} dispatch={dispatch} />
          ) : (
            <InverseSizing system={system} onUse={pickBore} />
          )}
          {mode === "design" && shownResult ? <PhoneSummary result={shownResult} system={system} stale={!current} /> : null}
        </div>
        <div id="results" className="flex min-w-0 scroll-mt-4 flex-col gap-4">
          {!check.ok ? (
            <p role="status" className="rounded-md bg-fail-soft px-3 py-2 text-sm text-fail ring-1 ring-fail/30">
              {shown ? "Showing the figures for the last valid inputs. " : ""}Fix the marked inputs to update the results.
              {check.other.length ? ` ${check.other.join(" ")}` : ""}
            </p>
          ) : null}
          {shown && shownResult ? (
            <div className={`flex flex-col gap-4 ${current ? "" : "opacity-60"}`}>
              <Card title="Results">
                <ResultsSummary input={shown.input} result={shownResult} system={system} />
              </Card>
              <SafetyCautions compact />
              <Card title="The press at a glance">
                <PressSchematic input={shown.input} result={shownResult} system={system} />
              </Card>
              <Card title="Checks">
                <OverallVerdict overall={shownResult.overall} missing={shownResult.missing} />
                <CheckList checks={shownResult.checks} />
              </Card>
              <Card title="Plots">
                <SizingCharts input={shown.input} result={shownResult} system={system} />
              </Card>
            </div>
          ) : null}
          <Card title="Gauge card and saving">
            <SavePlan name={name} onNameChange={setName} input={current?.input ?? null} system={system} context={save} />
          </Card>
        </div>
      </div>
    </div>
  );
}
