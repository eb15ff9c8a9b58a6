"use server";

import { z } from "zod";
import type { ActionState } from "@/lib/action-state";
import { assertSameOriginAction, setSessionCookie } from "@/lib/auth/action-guard";
import { requestIp, requireSignedIn } from "@/lib/auth/current";
import { formatWait } from "@/lib/auth/throttle-policy";
import { changePassword, updateUnitSystem } from "@/lib/data/users";
import { changePasswordSchema } from "@/lib/validation/auth";
import { fieldErrorsOf } from "@/lib/validation/field-errors";
import { revalidateSignedInPages } from "@/lib/revalidate";

export async function changePasswordAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const { user } = await requireSignedIn();
  const parsed = changePasswordSchema.safeParse({
    currentPassword: form.get("currentPassword"),
    newPassword: form.get("newPassword"),
    confirmPassword: form.get("confirmPassword"),
  });
  if (!parsed.success) return { ok: false, fieldErrors: fieldErrorsOf(parsed.error.issues) };
  const result = await changePassword({ userId: user.id }, { ...parsed.data, ip: await requestIp() });
  if (!result.ok && result.reason === "throttled") {
    return { ok: false, message: `Too many wrong passwords. Try again in ${formatWait(result.retryAfterS)}.` };
  }
  if (!result.ok) return { ok: false, fieldErrors: { currentPassword: ["That is not your current password."] } };
  await setSessionCookie(result.token);
  return { ok: true, message: "Password changed. You were signed out everywhere else." };
}

export async function updateUnitsAction(form: FormData): Promise<void> {
  await assertSameOriginAction();
  const { user } = await requireSignedIn();
  const units = z.enum(["metric", "imperial"]).safeParse(form.get("unitSystem"));
  if (units.success) await updateUnitSystem({ userId: user.id }, units.data);
  revalidateSignedInPages();
}
