import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { SignUpForm } from "@/components/auth/sign-up-form";
import { Card } from "@/components/ui/card";
import { getCurrentSession } from "@/lib/auth/current";

export const metadata: Metadata = { title: "Create an account" };

export default async function SignUpPage() {
  if (await getCurrentSession()) redirect("/dashboard");
  return (
    <div className="mx-auto w-full max-w-md px-4 py-10">
      <h1 className="mb-2 text-2xl font-semibold tracking-tight">Create an account</h1>
      <p className="mb-6 text-sm text-steel-600">
        You get a personal shop for your own presses. A shared workshop can invite you later.
      </p>
      <Card>
        <SignUpForm />
      </Card>
    </div>
  );
}
