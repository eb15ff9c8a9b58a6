"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { initialActionState } from "@/lib/action-state";
import { changePasswordAction } from "../actions";

export function ChangePasswordForm() {
  const [state, action, pending] = useActionState(changePasswordAction, initialActionState);
  return (
    <form action={action} className="flex flex-col gap-4" noValidate key={state.ok ? "done" : "editing"}>
      <FormMessage message={state.message} tone={state.ok ? "success" : "error"} />
      <Field name="currentPassword" label="Current password" type="password" autoComplete="current-password" required errors={state.fieldErrors?.currentPassword} />
      <Field name="newPassword" label="New password" type="password" autoComplete="new-password" required hint="At least 8 characters; common passwords are refused." errors={state.fieldErrors?.newPassword} />
      <Field name="confirmPassword" label="New password again" type="password" autoComplete="new-password" required errors={state.fieldErrors?.confirmPassword} />
      <Button type="submit" disabled={pending} className="self-start">
        {pending ? "Changing…" : "Change password"}
      </Button>
    </form>
  );
}
