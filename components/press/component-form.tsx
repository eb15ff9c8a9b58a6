"use client";

import { useActionState, useState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SelectField } from "@/components/ui/select-field";
import { initialActionState, type ActionState } from "@/lib/action-state";
import { KIND_LABELS, SPEC_FIELDS, type SpecField } from "@/lib/press/component-fields";
import { displayUnit, type UnitSystem } from "@/lib/units";
import type { ComponentKind } from "@/lib/validation/component-spec";

type Props = {
  action: (state: ActionState, form: FormData) => Promise<ActionState>;
  mode: "add" | "edit" | "replace";
  kind?: ComponentKind;
  initial: Record<string, string>;
  units: UnitSystem;
  currency: string;
  today: string;
};

const KIND_OPTIONS = (Object.keys(KIND_LABELS) as ComponentKind[]).map((k) => ({ value: k, label: KIND_LABELS[k] }));

/** Add, edit or replace a part; the spec fields follow the chosen kind and the user's units. */
export function ComponentForm({ action, mode, kind: fixedKind, initial, units, currency, today }: Props) {
  const [state, formAction, pending] = useActionState(action, initialActionState);
  const [kind, setKind] = useState<ComponentKind>(fixedKind ?? (initial.kind as ComponentKind | undefined) ?? "cylinder");
  const value = (name: string) => state.values?.[name] ?? initial[name] ?? "";
  const errors = (name: string) => state.fieldErrors?.[name];
  return (
    <form action={formAction} className="flex flex-col gap-5" noValidate>
      <FormMessage message={state.message} />
      {mode === "replace" ? (
        <fieldset className="grid gap-4 rounded-md bg-steel-50 p-3 sm:grid-cols-2">
          <legend className="px-1 text-sm font-semibold">Why and when the old part came out</legend>
          <Field name="reason" label="Reason" required maxLength={255} defaultValue={value("reason")} errors={errors("reason")} />
          <Field name="removedOn" label="Removed on" type="date" required defaultValue={value("removedOn") || today} errors={errors("removedOn")} />
        </fieldset>
      ) : null}
      {mode === "add" ? (
        <SelectField name="kind" label="Kind of part" options={KIND_OPTIONS} value={kind} onChange={(e) => setKind(e.target.value as ComponentKind)} errors={errors("kind")} />
      ) : (
        <input type="hidden" name="kind" value={kind} />
      )}
      <Field name="label" label="Name" required maxLength={100} placeholder={`e.g. ${KIND_LABELS[kind]} 1`} defaultValue={value("label")} errors={errors("label")} />
      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-sm font-semibold">{KIND_LABELS[kind]} figures</legend>
        {SPEC_FIELDS[kind].map((f) => (
          <SpecInput key={`${kind}-${f.name}`} field={f} units={units} defaultValue={value(`spec.${f.name}`)} errors={errors(`spec.${f.name}`)} />
        ))}
      </fieldset>
      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-sm font-semibold">Source and cost</legend>
        <Field name="maker" label="Maker" maxLength={100} defaultValue={value("maker")} errors={errors("maker")} />
        <Field name="partNumber" label="Part number" maxLength={100} defaultValue={value("partNumber")} errors={errors("partNumber")} />
        <Field name="supplier" label="Supplier" maxLength={100} defaultValue={value("supplier")} errors={errors("supplier")} />
        <Field name="cost" label={`Cost (${currency})`} inputMode="decimal" defaultValue={value("cost")} errors={errors("costCents")} />
        <Field name="installedOn" label="Installed on" type="date" defaultValue={value("installedOn")} errors={errors("installedOn")} />
        <label className="flex min-h-11 items-center gap-2 self-end text-sm">
          <input type="checkbox" name="purchased" defaultChecked={(value("purchased") || "on") === "on"} className="h-5 w-5" />
          Already bought
        </label>
      </fieldset>
      <Button type="submit" disabled={pending} className="self-start">
        {pending ? "Saving…" : mode === "add" ? "Add part" : mode === "edit" ? "Save part" : "Replace part"}
      </Button>
    </form>
  );
}

function SpecInput({ field, units, defaultValue, errors }: { field: SpecField; units: UnitSystem; defaultValue: string; errors?: string[] }) {
  const name = `spec.${field.name}`;
  const optional = field.required ? "" : " — optional";
  if (field.type === "select") {
    return <SelectField name={name} label={field.label} options={field.options.map((o) => ({ value: o, label: o }))} defaultValue={defaultValue || field.options[0]} errors={errors} />;
  }
  const unit = field.type === "quantity" ? ` (${displayUnit(field.quantity, units).symbol})` : field.type === "number" ? ` (${field.unit})` : "";
  return (
    <Field
      name={name}
      label={`${field.label}${unit}${optional}`}
      type={field.type === "date" ? "date" : "text"}
      inputMode={field.type === "quantity" || field.type === "number" ? "decimal" : undefined}
      defaultValue={defaultValue}
      errors={errors}
    />
  );
}
