"use client";

import { useActionState, useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FieldError } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SelectField } from "@/components/ui/select-field";
import { initialActionState, type ActionState } from "@/lib/action-state";
import { displayUnit, type UnitSystem } from "@/lib/units";
import { SERVICE_KIND_OPTIONS } from "./kind-options";

type Action = (state: ActionState, form: FormData) => Promise<ActionState>;
type Props = {
  action: Action;
  units: UnitSystem;
  currency: string;
  today: string;
  currentHours: number;
  hoses: { id: string; label: string }[];
  /** A correction: the kind is fixed and only the correctable fields show. */
  correction?: { kind: string; values: Record<string, string> };
};

/** Logs service on a press, or corrects an entry. Fields follow the kind of work. */
export function ServiceEntryForm({ action, units, currency, today, currentHours, hoses, correction }: Props) {
  const [state, formAction, pending] = useActionState(action, initialActionState);
  const v: Record<string, string> = { performedOn: today, kind: "filter-changed", ...correction?.values, ...(state.ok ? {} : state.values) };
  const [kind, setKind] = useState(correction?.kind ?? v.kind ?? "filter-changed");
  const errors = state.fieldErrors ?? {};
  const pressure = displayUnit("pressure", units).symbol;
  // Errors on fields this kind does not show (e.g. after the kind was changed) still reach the reader.
  const shown = new Set(["kind", "performedOn", "hours", "componentId", "replacementLabel", "iso4406", "reliefFound", "reliefSet", "parts", "cost", "notes"]);
  const other = Object.entries(errors).filter(([key]) => !shown.has(key) || (key === "componentId" && kind !== "hose-replaced"));
  return (
    <form action={formAction} className="flex flex-col gap-4" noValidate>
      <FormMessage message={state.message} tone={state.ok ? "success" : "error"} />
      {other.length > 0 ? <p className="text-sm text-fail">{other.flatMap(([, messages]) => messages ?? []).join(" ")}</p> : null}
      <div className="grid gap-3 sm:grid-cols-3 [&>*]:min-w-0 [&_select]:w-full [&_select]:min-w-0">
        {correction ? null : <SelectField name="kind" label="Work done" options={SERVICE_KIND_OPTIONS} defaultValue={v.kind} onChange={(e) => setKind(e.target.value)} errors={errors.kind} />}
        <Field name="performedOn" label="Date" type="date" max={today} required defaultValue={v.performedOn} errors={errors.performedOn} />
        {correction ? null : (
          <Field name="hours" label="Hour meter (h) — optional" inputMode="decimal" placeholder={`last ${currentHours}`} defaultValue={v.hours} errors={errors.hours} hint="Recorded in the hour-meter log too; never below the last reading." />
        )}
      </div>
      {kind === "hose-replaced" && !correction ? (
        <div className="grid gap-3 sm:grid-cols-2 [&>*]:min-w-0 [&_select]:w-full [&_select]:min-w-0">
          <div className="flex flex-col gap-1">
            <label htmlFor="field-componentId" className="text-sm font-medium text-steel-800">
              Hose replaced
            </label>
            <select id="field-componentId" name="componentId" defaultValue={v.componentId ?? ""} aria-invalid={errors.componentId ? true : undefined} aria-describedby={errors.componentId ? "field-componentId-error" : undefined} className="min-h-11 rounded-md border border-steel-300 bg-white px-3">
              <option value="">Choose a hose…</option>
              {hoses.map((h) => (
                <option key={h.id} value={h.id}>
                  {h.label}
                </option>
              ))}
            </select>
            <FieldError id="field-componentId-error" errors={errors.componentId} />
          </div>
          <Field name="replacementLabel" label="Name of the new hose — optional" maxLength={100} defaultValue={v.replacementLabel} errors={errors.replacementLabel} hint="The new hose gets the old one's specification; edit it under Parts if it differs." />
        </div>
      ) : null}
      {kind === "oil-sample" ? <Field name="iso4406" label="ISO 4406 code" placeholder="18/16/13" defaultValue={v.iso4406} errors={errors.iso4406} hint="Three numbers for ≥4, ≥6 and ≥14 µm(c); they never increase." /> : null}
      {kind === "relief-checked" ? (
        <div className="grid gap-3 sm:grid-cols-2 [&>*]:min-w-0 [&_select]:w-full [&_select]:min-w-0">
          <Field name="reliefFound" label={`Setting found (${pressure})`} inputMode="decimal" defaultValue={v.reliefFound} errors={errors.reliefFound} />
          <Field name="reliefSet" label={`Setting left (${pressure})`} inputMode="decimal" defaultValue={v.reliefSet} errors={errors.reliefSet} hint="Never above the lowest-rated component." />
        </div>
      ) : null}
      <div className="flex flex-col gap-1">
        <label htmlFor="field-parts" className="text-sm font-medium text-steel-800">
          Parts used — one per line, e.g. “1 × filter element 10 µm”
        </label>
        <textarea id="field-parts" name="parts" rows={3} defaultValue={v.parts} aria-describedby={errors.parts ? "field-parts-error" : undefined} className="rounded-md border border-steel-300 bg-white px-3 py-2" />
        <FieldError id="field-parts-error" errors={errors.parts} />
      </div>
      <div className="grid gap-3 sm:grid-cols-3 [&>*]:min-w-0 [&_select]:w-full [&_select]:min-w-0">
        <Field name="cost" label={`Cost (${currency}) — optional`} inputMode="decimal" defaultValue={v.cost} errors={errors.cost} />
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor="field-notes" className="text-sm font-medium text-steel-800">
          Notes
        </label>
        <textarea id="field-notes" name="notes" rows={3} maxLength={4000} defaultValue={v.notes} className="rounded-md border border-steel-300 bg-white px-3 py-2" />
        <FieldError id="field-notes-error" errors={errors.notes} />
      </div>
      <div>
        <Button type="submit" disabled={pending}>
          {correction ? "Save correction" : "Log service"}
        </Button>
      </div>
    </form>
  );
}
