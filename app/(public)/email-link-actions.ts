"use server";

import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { z } from "zod";
import { echoValues, type ActionState } from "@/lib/action-state";
import { refusalState } from "@/lib/action-refusal";
import { assertSameOriginAction, setSessionCookie } from "@/lib/auth/action-guard";
import { getCurrentSession, requestIp } from "@/lib/auth/current";
import { createSession } from "@/lib/auth/session";
import { acceptInvitation, signUpWithInvitation } from "@/lib/data/invitations";
import { requestPasswordReset, resetPassword } from "@/lib/data/password-resets";
import { hitRateLimit, PASSWORD_RESET_LIMIT } from "@/lib/rate-limit";
import { forgotPasswordSchema, inviteSignUpSchema, resetPasswordSchema } from "@/lib/validation/email-links";

const LINK_PROBLEMS = {
  invalid: "This link is not valid. Check that the whole link was copied.",
  used: "This link has already been used (or was withdrawn).",
  expired: "This link has expired. Ask for a new one.",
} as const;

/** The origin the visitor used, for links in e-mails when APP_URL is not set. */
export async function requestOrigin(): Promise<string | null> {
  const h = await headers();
  const host = h.get("host");
  return host ? `${h.get("x-forwarded-proto") ?? "http"}://${host}` : null;
}

export async function forgotPasswordAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const values = echoValues(form);
  const parsed = forgotPasswordSchema.safeParse({ email: form.get("email") });
  if (!parsed.success) return { ok: false, fieldErrors: z.flattenError(parsed.error).fieldErrors, values };
  const limit = await hitRateLimit(PASSWORD_RESET_LIMIT, await requestIp());
  if (!limit.allowed) return { ok: false, message: `Too many requests from here. Try again in ${Math.ceil(limit.retryAfterS / 60)} minutes.`, values };
  await requestPasswordReset(parsed.data.email, await requestOrigin());
  // The same answer whether or not an account has this address.
  return { ok: true, message: "If an account uses this address, a link to choose a new password is on its way. It works for 30 minutes." };
}

export async function resetPasswordAction(token: string, _prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const parsed = resetPasswordSchema.safeParse({ password: form.get("password"), confirmPassword: form.get("confirmPassword") });
  if (!parsed.success) return { ok: false, message: "Please fix the marked fields.", fieldErrors: z.flattenError(parsed.error).fieldErrors };
  const result = await resetPassword(token, parsed.data.password);
  if (!result.ok) return { ok: false, message: LINK_PROBLEMS[result.reason] };
  redirect("/sign-in?reset=1");
}

export async function acceptInvitationAction(token: string, _prev: ActionState, _form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const current = await getCurrentSession();
  if (!current) redirect(`/sign-in?next=${encodeURIComponent(`/invite/${token}`)}`);
  try {
    const result = await acceptInvitation({ userId: current.user.id }, token);
    if (!result.ok) return { ok: false, message: LINK_PROBLEMS[result.reason] };
  } catch (error) {
    return refusalState(error, {});
  }
  redirect("/dashboard");
}

export async function inviteSignUpAction(token: string, _prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const values = echoValues(form, ["password"]);
  const parsed = inviteSignUpSchema.safeParse({ displayName: form.get("displayName"), password: form.get("password") });
  if (!parsed.success) return { ok: false, message: "Please fix the marked fields.", fieldErrors: z.flattenError(parsed.error).fieldErrors, values };
  try {
    const result = await signUpWithInvitation(token, parsed.data);
    if (!("userId" in result)) return { ok: false, message: result.ok ? undefined : LINK_PROBLEMS[result.reason], values };
    const { token: sessionToken } = await createSession(result.userId);
    await setSessionCookie(sessionToken);
  } catch (error) {
    return refusalState(error, values);
  }
  redirect("/dashboard");
}
