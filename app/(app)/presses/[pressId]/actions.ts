"use server";

import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { refusalState } from "@/lib/action-refusal";
import type { ActionState } from "@/lib/action-state";
import { assertSameOriginAction } from "@/lib/auth/action-guard";
import { requireShopContext } from "@/lib/auth/current";
import { createComponent, deleteComponent, removeComponent, replaceComponent, updateComponent } from "@/lib/data/components";
import { correctHourMeter, recordHourMeter } from "@/lib/data/press-edits";
import { componentFromForm } from "@/lib/press/component-form";
import { fieldErrorsFrom, formValues, plainNumber } from "@/lib/press/form-values";
import { componentInputSchema, hourCorrectionSchema, hourReadingSchema, replaceComponentSchema } from "@/lib/validation/press";

export async function addComponentAction(pressId: string, _prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const { user } = await requireShopContext();
  const values = formValues(form);
  const parsed = componentInputSchema.safeParse(componentFromForm(values, user.unitSystem));
  if (!parsed.success) return { ok: false, message: "Please fix the marked fields.", fieldErrors: fieldErrorsFrom(parsed.error.issues), values };
  try {
    await createComponent({ userId: user.id }, pressId, parsed.data);
  } catch (error) {
    return refusalState(error, values);
  }
  revalidatePath(`/presses/${pressId}`);
  redirect(`/presses/${pressId}#components`);
}

export async function editComponentAction(pressId: string, componentId: string, _prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const { user } = await requireShopContext();
  const values = formValues(form);
  // The hidden kind field lets the full schema check the spec; the data layer re-checks it against the stored kind.
  const parsed = componentInputSchema.safeParse(componentFromForm(values, user.unitSystem));
  if (!parsed.success) return { ok: false, message: "Please fix the marked fields.", fieldErrors: fieldErrorsFrom(parsed.error.issues), values };
  const { kind: _kind, ...patch } = parsed.data;
  try {
    await updateComponent({ userId: user.id }, componentId, patch);
  } catch (error) {
    return refusalState(error, values);
  }
  revalidatePath(`/presses/${pressId}`);
  redirect(`/presses/${pressId}#components`);
}

export async function replaceComponentAction(pressId: string, componentId: string, _prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const { user } = await requireShopContext();
  const values = formValues(form);
  const outer = replaceComponentSchema.safeParse({ reason: values.reason ?? "", removedOn: values.removedOn ?? "", replacement: {} });
  const replacement = componentInputSchema.safeParse(componentFromForm(values, user.unitSystem));
  if (!outer.success || !replacement.success) {
    const issues = [...(outer.error?.issues ?? []), ...(replacement.error?.issues ?? [])];
    return { ok: false, message: "Please fix the marked fields.", fieldErrors: fieldErrorsFrom(issues), values };
  }
  try {
    await replaceComponent({ userId: user.id }, componentId, { reason: outer.data.reason, removedOn: outer.data.removedOn, replacement: replacement.data });
  } catch (error) {
    return refusalState(error, values);
  }
  revalidatePath(`/presses/${pressId}`);
  redirect(`/presses/${pressId}#history`);
}

export async function removeComponentAction(pressId: string, componentId: string, _prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const { user } = await requireShopContext();
  const values = formValues(form);
  try {
    if (values.mode === "delete") await deleteComponent({ userId: user.id }, componentId);
    else {
      const parsed = replaceComponentSchema.pick({ reason: true, removedOn: true }).safeParse({ reason: values.reason ?? "", removedOn: values.removedOn ?? "" });
      if (!parsed.success) return { ok: false, fieldErrors: fieldErrorsFrom(parsed.error.issues), values };
      await removeComponent({ userId: user.id }, componentId, parsed.data);
    }
  } catch (error) {
    return refusalState(error, values);
  }
  revalidatePath(`/presses/${pressId}`);
  redirect(`/presses/${pressId}#components`);
}

export async function recordHoursAction(pressId: string, _prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const { user } = await requireShopContext();
  const values = formValues(form);
  const parsed = hourReadingSchema.safeParse({ hours: plainNumber(values.hours), note: values.note?.trim() || null });
  if (!parsed.success) return { ok: false, fieldErrors: fieldErrorsFrom(parsed.error.issues), values };
  try {
    await recordHourMeter({ userId: user.id }, pressId, parsed.data);
  } catch (error) {
    return refusalState(error, values);
  }
  revalidatePath(`/presses/${pressId}`);
  return { ok: true, message: `Recorded ${parsed.data.hours} h.` };
}

export async function correctHoursAction(pressId: string, _prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const { user } = await requireShopContext();
  const values = formValues(form);
  const parsed = hourCorrectionSchema.safeParse({ hours: plainNumber(values.hours), reason: values.reason ?? "" });
  if (!parsed.success) return { ok: false, fieldErrors: fieldErrorsFrom(parsed.error.issues), values };
  try {
    await correctHourMeter({ userId: user.id }, pressId, parsed.data);
  } catch (error) {
    return refusalState(error, values, "Only a manager of this shop can correct the hour meter.");
  }
  revalidatePath(`/presses/${pressId}`);
  return { ok: true, message: `Corrected the hour meter to ${parsed.data.hours} h.` };
}
