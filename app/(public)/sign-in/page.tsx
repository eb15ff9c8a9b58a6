import type { Metadata } from "next";
import Link from "next/link";
import { Suspense } from "react";
import { SignInNotices } from "@/components/auth/sign-in-link";
import { SignInForm } from "@/components/auth/sign-in-form";
import { Card } from "@/components/ui/card";

export const metadata: Metadata = { title: "Sign in" };

/** Prerendered: the link's ?next= and notices are read in the browser (components/auth/sign-in-link.tsx). */
export default function SignInPage() {
  return (
    <div className="mx-auto w-full max-w-md px-4 py-10">
      <h1 className="mb-6 text-2xl font-semibold tracking-tight">Sign in</h1>
      <Suspense fallback={null}>
        <SignInNotices />
      </Suspense>
      <Card>
        <SignInForm />
      </Card>
      <p className="mt-4 text-sm">
        <Link href="/forgot-password" className="underline">
          Forgot your password?
        </Link>
      </p>
    </div>
  );
}
