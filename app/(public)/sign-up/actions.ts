"use server";

import { redirect } from "next/navigation";
import { echoValues, type ActionState } from "@/lib/action-state";
import { assertSameOriginAction } from "@/lib/auth/action-guard";
import { requestIp } from "@/lib/auth/current";
import { formatWait } from "@/lib/auth/throttle-policy";
import { requestAccount } from "@/lib/data/sign-up";
import { signUpSchema } from "@/lib/validation/auth";
import { fieldErrorsOf } from "@/lib/validation/field-errors";

/**
 * Answers the same whether or not the address already has an account (see requestAccount): the
 * person continues on the sign-in page, where a new account's password works.
 */
export async function signUpAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const values = echoValues(form, ["password"]);
  const parsed = signUpSchema.safeParse({
    displayName: form.get("displayName"),
    email: form.get("email"),
    password: form.get("password"),
  });
  if (!parsed.success) {
    return { ok: false, message: "Please fix the marked fields.", fieldErrors: fieldErrorsOf(parsed.error.issues), values };
  }
  const result = await requestAccount(parsed.data, await requestIp());
  if (!result.ok) {
    return { ok: false, message: `Too many sign-up attempts. Try again in ${formatWait(result.retryAfterS)}.`, values };
  }
  redirect("/sign-in?signed-up=1");
}
