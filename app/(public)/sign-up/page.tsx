import type { Metadata } from "next";
import { SignUpForm } from "@/components/auth/sign-up-form";
import { RedirectWhenSignedIn } from "@/components/shell/redirect-when-signed-in";
import { Card } from "@/components/ui/card";

export const metadata: Metadata = { title: "Create an account" };

export default function SignUpPage() {
  return (
    <div className="mx-auto w-full max-w-md px-4 py-10">
      <RedirectWhenSignedIn to="/dashboard" />
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
