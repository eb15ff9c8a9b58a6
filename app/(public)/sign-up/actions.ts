"use server";

import { redirect } from "next/navigation";
import { z } from "zod";
import { echoValues, type ActionState } from "@/lib/action-state";
import { assertSameOriginAction, setSessionCookie } from "@/lib/auth/action-guard";
import { createSession } from "@/lib/auth/session";
import { createUserWithPersonalShop, EmailTakenError } from "@/lib/data/users";
import { signUpSchema } from "@/lib/validation/auth";

export async function signUpAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const values = echoValues(form, ["password"]);
  const parsed = signUpSchema.safeParse({
    displayName: form.get("displayName"),
    email: form.get("email"),
    password: form.get("password"),
  });
  if (!parsed.success) {
    return { ok: false, message: "Please fix the marked fields.", fieldErrors: z.flattenError(parsed.error).fieldErrors, values };
  }
  try {
    const { userId } = await createUserWithPersonalShop(parsed.data);
    const { token } = await createSession(userId);
    await setSessionCookie(token);
  } catch (error) {
    if (error instanceof EmailTakenError) {
      return { ok: false, fieldErrors: { email: [error.message + " Sign in instead?"] }, values };
    }
    throw error;
  }
  redirect("/dashboard");
}
