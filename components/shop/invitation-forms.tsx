"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SelectField } from "@/components/ui/select-field";
import { initialActionState, type ActionState } from "@/lib/action-state";

type Action = (state: ActionState, form: FormData) => Promise<ActionState>;

const ROLE_OPTIONS = [
  { value: "member", label: "Member — books and uses presses" },
  { value: "inspector", label: "Inspector — inspects, logs service, tags out" },
  { value: "manager", label: "Manager — runs the shop's records" },
];

export function InviteForm({ action }: { action: Action }) {
  const [state, formAction, pending] = useActionState(action, initialActionState);
  return (
    <form action={formAction} className="flex flex-col gap-3" noValidate key={state.ok ? state.message : "invite"}>
      <FormMessage message={state.message} tone={state.ok ? "success" : "error"} />
      <div className="grid gap-3 sm:grid-cols-[2fr_1fr] [&>*]:min-w-0 [&_select]:w-full [&_select]:min-w-0">
        <Field name="email" id="invite-email" label="E-mail address" type="email" required defaultValue={state.ok ? "" : state.values?.email} errors={state.fieldErrors?.email} />
        <SelectField name="role" id="invite-role" label="Role" options={ROLE_OPTIONS} defaultValue={state.values?.role ?? "member"} errors={state.fieldErrors?.role} />
      </div>
      <div>
        <Button type="submit" disabled={pending}>
          Send invitation
        </Button>
      </div>
    </form>
  );
}

export function InvitationCommands({ action, email }: { action: Action; email: string }) {
  const [state, formAction, pending] = useActionState(action, initialActionState);
  return (
    <form action={formAction} className="flex flex-wrap items-center gap-2">
      <Button type="submit" name="intent" value="resend" variant="secondary" disabled={pending} aria-label={`Send the invitation to ${email} again`}>
        Resend
      </Button>
      <Button type="submit" name="intent" value="revoke" variant="quiet" disabled={pending} aria-label={`Withdraw the invitation to ${email}`}>
        Withdraw
      </Button>
      {state.message ? <span className={`text-xs ${state.ok ? "text-ok" : "text-fail"}`}>{state.message}</span> : null}
    </form>
  );
}
