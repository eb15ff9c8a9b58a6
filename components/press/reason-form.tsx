"use client";

import { useActionState, useId } from "react";
import { Button, type ButtonVariant } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { initialActionState, type ActionState } from "@/lib/action-state";

type Props = { action: (state: ActionState, form: FormData) => Promise<ActionState>; label: string; submit: string; variant?: ButtonVariant; placeholder?: string };

/** A one-field form that records why (tag out, clear a tag-out). */
export function ReasonForm({ action, label, submit, variant = "secondary", placeholder }: Props) {
  const [state, formAction, pending] = useActionState(action, initialActionState);
  const id = useId();
  return (
    <form action={formAction} className="flex flex-col gap-2" noValidate>
      <FormMessage message={state.message} tone={state.ok ? "success" : "error"} />
      <div className="flex flex-wrap items-end gap-2">
        <Field id={id} name="reason" label={label} maxLength={500} required placeholder={placeholder} defaultValue={state.ok ? "" : state.values?.reason} errors={state.fieldErrors?.reason} className="min-w-0 flex-1" />
        <Button type="submit" variant={variant} disabled={pending}>
          {submit}
        </Button>
      </div>
    </form>
  );
}
