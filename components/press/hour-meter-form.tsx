"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { initialActionState, type ActionState } from "@/lib/action-state";

type Props = { action: (state: ActionState, form: FormData) => Promise<ActionState>; current: number };

export function HourMeterForm({ action, current }: Props) {
  const [state, formAction, pending] = useActionState(action, initialActionState);
  return (
    <form action={formAction} className="flex flex-col gap-3" noValidate>
      <FormMessage message={state.message} tone={state.ok ? "success" : "error"} />
      <div className="flex flex-wrap items-end gap-3">
        <Field name="hours" label="Reading now (h)" inputMode="decimal" required placeholder={String(current)} defaultValue={state.ok ? "" : state.values?.hours} errors={state.fieldErrors?.hours} className="w-40" />
        <Field name="note" label="Note — optional" maxLength={255} defaultValue={state.ok ? "" : state.values?.note} errors={state.fieldErrors?.note} className="min-w-48 flex-1" />
        <Button type="submit" variant="secondary" disabled={pending}>
          Record
        </Button>
      </div>
    </form>
  );
}

/** A manager's correction of a wrong reading: the right value and why (kept in the history). */
export function HourCorrectionForm({ action }: { action: Props["action"] }) {
  const [state, formAction, pending] = useActionState(action, initialActionState);
  return (
    <details className="mt-4 rounded-md border border-steel-200 px-3 py-2 text-sm" open={!state.ok && Boolean(state.message || state.fieldErrors)}>
      <summary className="cursor-pointer font-semibold text-steel-800">Correct a wrong reading</summary>
      <form action={formAction} className="mt-3 flex flex-col gap-3" noValidate>
        <p className="text-steel-600">Readings above the value you enter are marked as replaced; they stay in the history with your reason.</p>
        <FormMessage message={state.message} tone={state.ok ? "success" : "error"} />
        <div className="flex flex-wrap items-end gap-3">
          <Field name="hours" label="Correct reading (h)" inputMode="decimal" required defaultValue={state.ok ? "" : state.values?.hours} errors={state.fieldErrors?.hours} className="w-40" />
          <Field name="reason" label="Why" required maxLength={255} defaultValue={state.ok ? "" : state.values?.reason} errors={state.fieldErrors?.reason} className="min-w-48 flex-1" />
          <Button type="submit" variant="secondary" disabled={pending}>
            Correct
          </Button>
        </div>
      </form>
    </details>
  );
}
