import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { SignInForm } from "@/components/auth/sign-in-form";
import { Card } from "@/components/ui/card";
import { FormMessage } from "@/components/ui/form-message";
import { getCurrentSession } from "@/lib/auth/current";
import { safeNextPath } from "@/lib/auth/safe-next";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({
  searchParams,
}: {
  searchParams: Promise<{ next?: string; "signed-up"?: string; reset?: string }>;
}) {
  const { next: rawNext, "signed-up": signedUp, reset } = await searchParams;
  // Only a path that stays on this site is carried into the form (and followed after sign-in).
  const next = safeNextPath(rawNext, "");
  if (await getCurrentSession()) redirect(next || "/dashboard");
  return (
    <div className="mx-auto w-full max-w-md px-4 py-10">
      <h1 className="mb-6 text-2xl font-semibold tracking-tight">Sign in</h1>
      {signedUp ? (
        // The same words whether or not the address already had an account (no enumeration).
        <div className="mb-4">
          <FormMessage
            tone="success"
            message="Thank you. If this address is new to Presswright, your account is ready: sign in below with the password you just chose. If the address already has an account, we have sent its owner an e-mail instead."
          />
        </div>
      ) : null}
      {reset ? (
        <div className="mb-4">
          <FormMessage tone="success" message="Password changed. Sign in with the new one." />
        </div>
      ) : null}
      <Card>
        <SignInForm next={next || undefined} />
      </Card>
      <p className="mt-4 text-sm">
        <Link href="/forgot-password" className="underline">
          Forgot your password?
        </Link>
      </p>
    </div>
  );
}
