"use client";

import Link from "next/link";
import { useActionState } from "react";
import { signUpAction } from "@/app/(public)/sign-up/actions";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { initialActionState } from "@/lib/action-state";

export function SignUpForm() {
  const [state, action, pending] = useActionState(signUpAction, initialActionState);
  return (
    <form action={action} className="flex flex-col gap-4" noValidate>
      <FormMessage message={state.message} />
      <Field name="displayName" label="Your name" autoComplete="name" required maxLength={80} defaultValue={state.values?.displayName} errors={state.fieldErrors?.displayName} />
      <Field name="email" label="E-mail" type="email" autoComplete="email" required defaultValue={state.values?.email} errors={state.fieldErrors?.email} />
      <Field
        name="password"
        label="Password"
        type="password"
        autoComplete="new-password"
        required
        hint="At least 8 characters. A few unrelated words make a strong one."
        errors={state.fieldErrors?.password}
      />
      <Button type="submit" disabled={pending}>
        {pending ? "Creating your account…" : "Create account"}
      </Button>
      <p className="text-sm text-steel-600">
        Already have an account?{" "}
        <Link href="/sign-in" className="font-semibold text-oil-700 underline">
          Sign in
        </Link>
      </p>
    </form>
  );
}
