"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { initialActionState, type ActionState } from "@/lib/action-state";

type Props = { action: (state: ActionState, form: FormData) => Promise<ActionState>; today: string; canDelete: boolean };

/** Take a part out of service (kept in history), or delete one entered by mistake. */
export function RemoveComponentForm({ action, today, canDelete }: Props) {
  const [state, formAction, pending] = useActionState(action, initialActionState);
  return (
    <div className="flex flex-col gap-6">
      <FormMessage message={state.message} />
      <form action={formAction} className="flex flex-col gap-4" noValidate>
        <input type="hidden" name="mode" value="remove" />
        <Field name="reason" label="Why it came out" required maxLength={255} defaultValue={state.values?.reason} errors={state.fieldErrors?.reason} />
        <Field name="removedOn" label="Removed on" type="date" required defaultValue={state.values?.removedOn ?? today} errors={state.fieldErrors?.removedOn} />
        <Button type="submit" variant="secondary" disabled={pending} className="self-start">
          Remove from the press
        </Button>
      </form>
      {canDelete ? (
        <form action={formAction} className="border-t border-steel-200 pt-4">
          <input type="hidden" name="mode" value="delete" />
          <p className="mb-3 text-sm text-steel-600">Entered by mistake? Deleting leaves no trace in the history.</p>
          <Button type="submit" variant="danger" disabled={pending}>
            Delete this entry
          </Button>
        </form>
      ) : null}
    </div>
  );
}
