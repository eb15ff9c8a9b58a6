import type { Metadata } from "next";
import Link from "next/link";
import { NewPasswordForm } from "@/components/email/link-forms";
import { Card } from "@/components/ui/card";
import { checkPasswordResetToken } from "@/lib/data/password-resets";
import { resetPasswordAction } from "../../email-link-actions";

export const metadata: Metadata = { title: "Choose a new password", referrer: "no-referrer" };

export default async function ResetPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const check = await checkPasswordResetToken(token);
  return (
    <div className="mx-auto w-full max-w-md px-4 py-10">
      <h1 className="mb-6 text-2xl font-semibold tracking-tight">Choose a new password</h1>
      <Card>
        {check.ok ? (
          <>
            <p className="mb-4 text-sm text-steel-600">Saving it signs this account out on every device.</p>
            <NewPasswordForm action={resetPasswordAction.bind(null, token)} />
          </>
        ) : (
          <p className="text-sm" role="alert">
            {check.reason === "expired" ? "This link has expired." : check.reason === "used" ? "This link has already been used." : "This link is not valid."}{" "}
            <Link href="/forgot-password" className="underline">
              Ask for a new one
            </Link>
            .
          </p>
        )}
      </Card>
    </div>
  );
}
