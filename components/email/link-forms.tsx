"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { initialActionState, type ActionState } from "@/lib/action-state";

type Action = (state: ActionState, form: FormData) => Promise<ActionState>;

export function ForgotPasswordForm({ action }: { action: Action }) {
  const [state, formAction, pending] = useActionState(action, initialActionState);
  return (
    <form action={formAction} className="flex flex-col gap-4" noValidate>
      <FormMessage message={state.message} tone={state.ok ? "success" : "error"} />
      <Field name="email" label="E-mail" type="email" autoComplete="email" required defaultValue={state.values?.email} errors={state.fieldErrors?.email} />
      <Button type="submit" disabled={pending}>
        Send me a link
      </Button>
    </form>
  );
}

export function NewPasswordForm({ action }: { action: Action }) {
  const [state, formAction, pending] = useActionState(action, initialActionState);
  return (
    <form action={formAction} className="flex flex-col gap-4" noValidate>
      <FormMessage message={state.message} tone={state.ok ? "success" : "error"} />
      <Field name="password" label="New password" type="password" autoComplete="new-password" required errors={state.fieldErrors?.password} />
      <Field name="confirmPassword" label="New password again" type="password" autoComplete="new-password" required errors={state.fieldErrors?.confirmPassword} />
      <Button type="submit" disabled={pending}>
        Save the new password
      </Button>
    </form>
  );
}

export function InviteSignUpForm({ action, email }: { action: Action; email: string }) {
  const [state, formAction, pending] = useActionState(action, initialActionState);
  return (
    <form action={formAction} className="flex flex-col gap-4" noValidate>
      <FormMessage message={state.message} tone={state.ok ? "success" : "error"} />
      <Field name="email" label="E-mail" type="email" value={email} readOnly disabled />
      <Field name="displayName" label="Your name" autoComplete="name" required defaultValue={state.values?.displayName} errors={state.fieldErrors?.displayName} />
      <Field name="password" label="Choose a password" type="password" autoComplete="new-password" required errors={state.fieldErrors?.password} />
      <Button type="submit" disabled={pending}>
        Create my account and join
      </Button>
    </form>
  );
}

export function AcceptInvitationForm({ action }: { action: Action }) {
  const [state, formAction, pending] = useActionState(action, initialActionState);
  return (
    <form action={formAction} className="flex flex-col gap-3">
      <FormMessage message={state.message} tone={state.ok ? "success" : "error"} />
      <Button type="submit" disabled={pending}>
        Join the shop
      </Button>
    </form>
  );
}
