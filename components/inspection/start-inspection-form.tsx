"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import { SelectField } from "@/components/ui/select-field";
import { initialActionState, type ActionState } from "@/lib/action-state";

type Option = { value: string; label: string };
type Props = {
  action: (state: ActionState, form: FormData) => Promise<ActionState>;
  templates: Option[];
  /** A choice of press on the shop's list; a press page passes its own id instead. */
  presses?: Option[];
  pressId?: string;
};

export function StartInspectionForm({ action, templates, presses = [], pressId }: Props) {
  const [state, formAction, pending] = useActionState(action, initialActionState);
  return (
    <form action={formAction} className="flex flex-col gap-3" noValidate>
      <FormMessage message={state.message} />
      <div className="flex flex-wrap items-end gap-3 [&>*]:min-w-0 [&>*]:flex-1">
        {pressId ? (
          <input type="hidden" name="pressId" value={pressId} />
        ) : (
          <SelectField name="pressId" label="Press" options={[{ value: "", label: "Choose…" }, ...presses]} defaultValue={state.values?.pressId} errors={state.fieldErrors?.pressId} />
        )}
        <SelectField name="templateId" label="Checklist" options={templates} defaultValue={state.values?.templateId} errors={state.fieldErrors?.templateId} />
        <Button type="submit" disabled={pending} className="flex-none">
          Start inspection
        </Button>
      </div>
    </form>
  );
}
