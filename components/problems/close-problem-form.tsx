"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { initialActionState, type ActionState } from "@/lib/action-state";

/** Managers and inspectors: close with a service-log entry id or a reason. */
export function CloseProblemForm({ problemId, action: submit }: { problemId: string; action: (prev: ActionState, form: FormData) => Promise<ActionState> }) {
  const [state, action, pending] = useActionState(submit, initialActionState);
  return (
    <form action={action} className="mt-2 flex flex-col gap-2 rounded-md bg-steel-50 p-3" noValidate>
      <FormMessage message={state.message} tone={state.ok ? "success" : "error"} />
      <Field id={`close-reason-${problemId}`} name="reason" label="How was it dealt with?" maxLength={500} defaultValue={state.values?.reason} errors={state.fieldErrors?.reason} />
      <Field
        id={`close-entry-${problemId}`}
        name="serviceEntryId"
        label="Service-log entry (optional)"
        hint="The id of the log entry that fixed it."
        defaultValue={state.values?.serviceEntryId}
        errors={state.fieldErrors?.serviceEntryId}
      />
      <Button type="submit" variant="secondary" disabled={pending} className="self-start">
        {pending ? "Closing…" : "Close report"}
      </Button>
    </form>
  );
}
