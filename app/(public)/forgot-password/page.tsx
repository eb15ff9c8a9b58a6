import type { Metadata } from "next";
import { ForgotPasswordForm } from "@/components/email/link-forms";
import { Card } from "@/components/ui/card";
import { forgotPasswordAction } from "../email-link-actions";

export const metadata: Metadata = { title: "Forgot your password" };

export default function ForgotPasswordPage() {
  return (
    <div className="mx-auto w-full max-w-md px-4 py-10">
      <h1 className="mb-2 text-2xl font-semibold tracking-tight">Forgot your password?</h1>
      <p className="mb-6 text-sm text-steel-600">Give the address you sign in with; we e-mail a link to choose a new password.</p>
      <Card>
        <ForgotPasswordForm action={forgotPasswordAction} />
      </Card>
    </div>
  );
}
