"use client";

import Link from "next/link";
import { Suspense, useActionState } from "react";
import { signInAction } from "@/app/(public)/sign-in/actions";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { initialActionState } from "@/lib/action-state";
import { NextPathField } from "./sign-in-link";

export function SignInForm() {
  const [state, action, pending] = useActionState(signInAction, initialActionState);
  return (
    <form action={action} className="flex flex-col gap-4" noValidate>
      <FormMessage message={state.message} />
      <Suspense fallback={null}>
        <NextPathField />
      </Suspense>
      <Field name="email" label="E-mail" type="email" autoComplete="username" required defaultValue={state.values?.email} errors={state.fieldErrors?.email} />
      <Field name="password" label="Password" type="password" autoComplete="current-password" required errors={state.fieldErrors?.password} />
      <Button type="submit" disabled={pending}>
        {pending ? "Signing in…" : "Sign in"}
      </Button>
      <p className="text-sm text-steel-600">
        New here?{" "}
        <Link href="/sign-up" className="font-semibold text-oil-700 underline">
          Create an account
        </Link>
      </p>
    </form>
  );
}
