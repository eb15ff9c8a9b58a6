"use server";

import { redirect } from "next/navigation";
import { z } from "zod";
import { echoValues, type ActionState } from "@/lib/action-state";
import { assertSameOriginAction, setSessionCookie } from "@/lib/auth/action-guard";
import { requestIp } from "@/lib/auth/current";
import { attemptSignIn } from "@/lib/auth/sign-in";
import { signInSchema } from "@/lib/validation/auth";

export async function signInAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const values = echoValues(form, ["password"]);
  const parsed = signInSchema.safeParse({ email: form.get("email"), password: form.get("password") });
  if (!parsed.success) {
    return { ok: false, fieldErrors: z.flattenError(parsed.error).fieldErrors, values };
  }
  const result = await attemptSignIn({ ...parsed.data, ip: await requestIp() });
  if (!result.ok) {
    const message =
      result.reason === "throttled"
        ? `Too many failed attempts. Try again in ${formatWait(result.retryAfterS)}.`
        : "That e-mail and password do not match an account.";
    return { ok: false, message, values };
  }
  await setSessionCookie(result.token);
  const next = form.get("next");
  redirect(typeof next === "string" && next.startsWith("/") && !next.startsWith("//") ? next : "/dashboard");
}

function formatWait(seconds: number): string {
  return seconds < 90 ? `${seconds} seconds` : `${Math.ceil(seconds / 60)} minutes`;
}
