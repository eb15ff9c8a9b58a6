"use server";

import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { echoValues, type ActionState } from "@/lib/action-state";
import { assertSameOriginAction, setSessionCookie } from "@/lib/auth/action-guard";
import { requestIp } from "@/lib/auth/current";
import { safeNextPath } from "@/lib/auth/safe-next";
import { attemptSignIn } from "@/lib/auth/sign-in";
import { formatWait } from "@/lib/auth/throttle-policy";
import { signInSchema } from "@/lib/validation/auth";
import { fieldErrorsOf } from "@/lib/validation/field-errors";

export async function signInAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const values = echoValues(form, ["password"]);
  const parsed = signInSchema.safeParse({ email: form.get("email"), password: form.get("password") });
  if (!parsed.success) {
    return { ok: false, fieldErrors: fieldErrorsOf(parsed.error.issues), values };
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
  redirect(safeNextPath(form.get("next") ?? nextOfSubmittingPage(await headers())));
}

/**
 * The prerendered sign-in page adds its ?next= field in the browser; a form sent before that (no
 * JavaScript, or a very quick click) still carries the page's address in Referer. Whatever it
 * says goes through safeNextPath like the field would.
 */
function nextOfSubmittingPage(requestHeaders: Headers): string | null {
  try {
    return new URL(requestHeaders.get("referer") ?? "").searchParams.get("next");
  } catch {
    return null;
  }
}
