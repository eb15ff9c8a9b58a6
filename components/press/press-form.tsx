"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SelectField } from "@/components/ui/select-field";
import { initialActionState, type ActionState } from "@/lib/action-state";
import { FRAME_TYPE_LABELS, LIFECYCLE_LABELS } from "@/lib/press-labels";
import { PRESS_QUANTITY_FIELDS } from "@/lib/press/press-form";
import { displayUnit, type UnitSystem } from "@/lib/units";

type Props = {
  action: (state: ActionState, form: FormData) => Promise<ActionState>;
  initial: Record<string, string>;
  units: UnitSystem;
  submitLabel: string;
};

const options = (labels: Record<string, string>) => Object.entries(labels).map(([value, label]) => ({ value, label }));

/** Create or edit a press; quantities are typed in the user's units and stored in SI. */
export function PressForm({ action, initial, units, submitLabel }: Props) {
  const [state, formAction, pending] = useActionState(action, initialActionState);
  const value = (name: string) => state.values?.[name] ?? initial[name] ?? "";
  const errors = (name: string) => state.fieldErrors?.[name];
  return (
    <form action={formAction} className="flex flex-col gap-4" noValidate>
      <FormMessage message={state.message} />
      <Field name="name" label="Name" required maxLength={100} defaultValue={value("name")} errors={errors("name")} />
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField name="frameType" label="Frame type" options={options(FRAME_TYPE_LABELS)} defaultValue={value("frameType") || "h-frame"} errors={errors("frameType")} />
        <SelectField name="lifecycle" label="Lifecycle" options={options(LIFECYCLE_LABELS)} defaultValue={value("lifecycle") || "planned"} errors={errors("lifecycle")} />
        {PRESS_QUANTITY_FIELDS.map((f) => (
          <Field
            key={f.name}
            name={f.name}
            label={`${f.label} (${displayUnit(f.quantity, units).symbol})`}
            inputMode="decimal"
            defaultValue={value(f.name)}
            errors={errors(f.name)}
          />
        ))}
        <Field name="location" label="Location in the shop" maxLength={100} defaultValue={value("location")} errors={errors("location")} />
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor="field-notes" className="text-sm font-medium text-steel-800">
          Notes
        </label>
        <textarea id="field-notes" name="notes" rows={3} maxLength={4000} defaultValue={value("notes")} className="rounded-md border border-steel-300 bg-white px-3 py-2 text-base" />
      </div>
      <Button type="submit" disabled={pending} className="self-start">
        {pending ? "Saving…" : submitLabel}
      </Button>
    </form>
  );
}
