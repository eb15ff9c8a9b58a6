"use server";

import { redirect } from "next/navigation";
import { refusalState } from "@/lib/action-refusal";
import type { ActionState } from "@/lib/action-state";
import { assertSameOriginAction } from "@/lib/auth/action-guard";
import { requireShopContext } from "@/lib/auth/current";
import { createPress, updatePress } from "@/lib/data/press-edits";
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
    return refusalState(error, values, "Only a manager of this shop can add presses.");
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
    return refusalState(error, values, "Only a manager of this shop can edit presses.");
  }
  redirect(`/presses/${pressId}`);
}
