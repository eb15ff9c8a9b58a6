import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { SignInForm } from "@/components/auth/sign-in-form";
import { Card } from "@/components/ui/card";
import { getCurrentSession } from "@/lib/auth/current";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ next?: string; reset?: string }> }) {
  if (await getCurrentSession()) redirect("/dashboard");
  const { next, reset } = await searchParams;
  return (
    <div className="mx-auto w-full max-w-md px-4 py-10">
      <h1 className="mb-6 text-2xl font-semibold tracking-tight">Sign in</h1>
      {reset ? <p role="status" className="mb-4 rounded-md bg-ok-soft px-3 py-2 text-sm text-ok ring-1 ring-ok/30">Password changed. Sign in with the new one.</p> : null}
      <Card>
        <SignInForm next={typeof next === "string" ? next : undefined} />
      </Card>
      <p className="mt-4 text-sm">
        <Link href="/forgot-password" className="underline">
          Forgot your password?
        </Link>
      </p>
    </div>
  );
}
