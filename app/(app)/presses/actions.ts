"use server";

import { redirect } from "next/navigation";
import type { ActionState } from "@/lib/action-state";
import { assertSameOriginAction } from "@/lib/auth/action-guard";
import { requireShopContext } from "@/lib/auth/current";
import { ForbiddenError } from "@/lib/auth/permissions";
import { createPress, updatePress } from "@/lib/data/press-edits";
import { ConflictError } from "@/lib/errors";
import { fieldErrorsFrom, formValues } from "@/lib/press/form-values";
import { pressFromForm } from "@/lib/press/press-form";
import { pressInputSchema, pressPatchSchema } from "@/lib/validation/press";

export async function createPressAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const { user, shop } = await requireShopContext();
  const values = formValues(form);
  const parsed = pressInputSchema.safeParse(pressFromForm(values, user.unitSystem));
  if (!parsed.success) return { ok: false, message: "Please fix the marked fields.", fieldErrors: fieldErrorsFrom(parsed.error.issues), values };
  let id: string;
  try {
    ({ id } = await createPress({ userId: user.id }, shop.id, parsed.data));
  } catch (error) {
    if (error instanceof ForbiddenError) return { ok: false, message: "Only a manager of this shop can add presses.", values };
    throw error;
  }
  redirect(`/presses/${id}`);
}

export async function updatePressAction(pressId: string, _prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const { user } = await requireShopContext();
  const values = formValues(form);
  const parsed = pressPatchSchema.safeParse(pressFromForm(values, user.unitSystem));
  if (!parsed.success) return { ok: false, message: "Please fix the marked fields.", fieldErrors: fieldErrorsFrom(parsed.error.issues), values };
  try {
    await updatePress({ userId: user.id }, pressId, parsed.data);
  } catch (error) {
    if (error instanceof ForbiddenError) return { ok: false, message: "Only a manager of this shop can edit presses.", values };
    if (error instanceof ConflictError) return { ok: false, message: error.message, values };
    throw error;
  }
  redirect(`/presses/${pressId}`);
}
