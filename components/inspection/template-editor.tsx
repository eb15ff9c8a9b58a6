"use client";

import { useActionState, useState } from "react";
import { CADENCES, INSPECTION_AREAS, type TemplateItem } from "@/db/schema/inspections";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SelectField } from "@/components/ui/select-field";
import { initialActionState, type ActionState } from "@/lib/action-state";
import { AREA_LABELS, CADENCE_LABELS } from "@/lib/inspections/labels";

type Draft = Omit<TemplateItem, "key"> & { key?: string; id: number };
type Props = { action: (state: ActionState, form: FormData) => Promise<ActionState>; name: string; cadence: (typeof CADENCES)[number]; items: TemplateItem[] };

const FLAGS = [
  ["critical", "Critical: a failure tags the press out"],
  ["photoOnFail", "Photo required on fail"],
  ["lockout", "Press locked out for this check"],
] as const;

/** Edits a checklist's items; the whole checklist is sent as one JSON field and checked on the server. */
export function TemplateEditor({ action, name, cadence, items }: Props) {
  const [state, formAction, pending] = useActionState(action, initialActionState);
  const [drafts, setDrafts] = useState<Draft[]>(() => items.map((item, id) => ({ ...item, id })));
  const [title, setTitle] = useState(name);
  const [often, setOften] = useState(cadence);
  const update = (id: number, patch: Partial<Draft>) => setDrafts((all) => all.map((d) => (d.id === id ? { ...d, ...patch } : d)));
  const payload = JSON.stringify({ name: title, cadence: often, items: drafts.map(({ id: _id, ...d }) => d) });
  return (
    <form action={formAction} className="flex flex-col gap-4" noValidate>
      <FormMessage message={state.message} tone={state.ok ? "success" : "error"} />
      <input type="hidden" name="template" value={payload} />
      <div className="grid gap-3 sm:grid-cols-2">
        <Field name="name" label="Name" value={title} maxLength={100} onChange={(e) => setTitle(e.target.value)} errors={state.fieldErrors?.name} />
        <SelectField name="cadence" label="How often" value={often} onChange={(e) => setOften(e.target.value as typeof often)} options={CADENCES.map((c) => ({ value: c, label: CADENCE_LABELS[c] }))} />
      </div>
      <p className="text-sm text-steel-600">Before-each-use checks may be signed by any member; every other checklist by an inspector or a manager. Inspections already started keep the items they started with.</p>
      <ol className="flex flex-col gap-3">
        {drafts.map((d, index) => (
          <li key={d.id} className="flex flex-col gap-2 rounded-md p-3 ring-1 ring-steel-200">
            <div className="grid gap-2 sm:grid-cols-[12rem_1fr]">
              <SelectField name={`area-${d.id}`} id={`area-${d.id}`} label={`Item ${index + 1}: area`} value={d.area} onChange={(e) => update(d.id, { area: e.target.value as Draft["area"] })} options={INSPECTION_AREAS.map((a) => ({ value: a, label: AREA_LABELS[a] }))} />
              <Field name={`text-${d.id}`} id={`text-${d.id}`} label="What to check" value={d.text} maxLength={200} onChange={(e) => update(d.id, { text: e.target.value })} errors={state.fieldErrors?.[`items.${index}.text`]} />
            </div>
            <Field name={`guidance-${d.id}`} id={`guidance-${d.id}`} label="Guidance (optional)" value={d.guidance} maxLength={500} onChange={(e) => update(d.id, { guidance: e.target.value })} />
            <div className="flex flex-wrap items-center gap-x-4 gap-y-1 text-sm">
              {FLAGS.map(([flag, label]) => (
                <label key={flag} className="inline-flex min-h-10 items-center gap-2">
                  <input type="checkbox" checked={d[flag]} onChange={(e) => update(d.id, { [flag]: e.target.checked })} className="size-4 accent-oil-500" />
                  {label}
                </label>
              ))}
              <Button type="button" variant="quiet" className="ml-auto" onClick={() => setDrafts((all) => all.filter((x) => x.id !== d.id))}>
                Remove
              </Button>
            </div>
          </li>
        ))}
      </ol>
      <div className="flex flex-wrap gap-2">
        <Button
          type="button"
          variant="secondary"
          onClick={() => setDrafts((all) => [...all, { id: Math.max(0, ...all.map((x) => x.id)) + 1, area: "hydraulics", text: "", guidance: "", critical: false, photoOnFail: false, lockout: false }])}
        >
          Add an item
        </Button>
        <Button type="submit" disabled={pending}>
          Save checklist
        </Button>
      </div>
    </form>
  );
}
