"use server";

import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { z } from "zod";
import { refusalState } from "@/lib/action-refusal";
import type { ActionState } from "@/lib/action-state";
import { assertSameOriginAction } from "@/lib/auth/action-guard";
import { requireShopContext } from "@/lib/auth/current";
import { createServiceEntry, updateServiceEntry } from "@/lib/data/service-log";
import { applyStartingPlan, createServiceTask, deleteServiceTask, updateServiceTask } from "@/lib/data/service-plan";
import { fieldErrorsFrom, formValues } from "@/lib/press/form-values";
import { correctionFromForm, ENTRY_FIELD_NAMES, entryFromForm, taskFromForm } from "@/lib/service/entry-form";
import { serviceEntryInputSchema, serviceEntryPatchSchema, serviceTaskInputSchema } from "@/lib/validation/service";

/** zod issues → the form's field names; a data-layer ZodError (future date, wrong part) lands on its field too. */
function invalid(error: z.ZodError, values: Record<string, string>): ActionState {
  const issues = error.issues.map((i) => ({ ...i, path: [ENTRY_FIELD_NAMES[String(i.path[0])] ?? String(i.path[0] ?? "form"), ...i.path.slice(1)] }));
  return { ok: false, message: "Please fix the marked fields.", fieldErrors: fieldErrorsFrom(issues), values };
}

async function run(values: Record<string, string>, work: () => Promise<unknown>): Promise<ActionState | null> {
  try {
    await work();
    return null;
  } catch (error) {
    if (error instanceof z.ZodError) return invalid(error, values);
    return refusalState(error, values);
  }
}

export async function logServiceAction(pressId: string, _prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const { user } = await requireShopContext();
  const values = formValues(form);
  const parsed = serviceEntryInputSchema.safeParse(entryFromForm(values, user.unitSystem));
  if (!parsed.success) return invalid(parsed.error, values);
  const refused = await run(values, () => createServiceEntry({ userId: user.id }, pressId, parsed.data));
  if (refused) return refused;
  revalidatePath(`/presses/${pressId}`);
  revalidatePath("/dashboard");
  redirect(`/presses/${pressId}#service`);
}

export async function correctServiceEntryAction(pressId: string, entryId: string, _prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const { user } = await requireShopContext();
  const values = formValues(form);
  const parsed = serviceEntryPatchSchema.safeParse(correctionFromForm(values, user.unitSystem));
  if (!parsed.success) return invalid(parsed.error, values);
  const refused = await run(values, () => updateServiceEntry({ userId: user.id }, entryId, parsed.data));
  if (refused) return refused;
  revalidatePath(`/presses/${pressId}`);
  revalidatePath(`/presses/${pressId}/service/${entryId}`);
  return { ok: true, message: "Correction saved; the change is kept below." };
}

export async function addServiceTaskAction(pressId: string, _prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const { user } = await requireShopContext();
  const values = formValues(form);
  const parsed = serviceTaskInputSchema.safeParse(taskFromForm(values));
  if (!parsed.success) return invalid(parsed.error, values);
  const refused = await run(values, () => createServiceTask({ userId: user.id }, pressId, parsed.data));
  if (refused) return refused;
  revalidatePath(`/presses/${pressId}`);
  revalidatePath("/dashboard");
  return { ok: true, message: `Added “${parsed.data.title}”.` };
}

export async function updateServiceTaskAction(pressId: string, taskId: string, _prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const { user } = await requireShopContext();
  const values = formValues(form);
  const parsed = serviceTaskInputSchema.safeParse(taskFromForm(values));
  if (!parsed.success) return invalid(parsed.error, values);
  const refused = await run(values, () => (values.intent === "delete" ? deleteServiceTask({ userId: user.id }, taskId) : updateServiceTask({ userId: user.id }, taskId, parsed.data)));
  if (refused) return refused;
  revalidatePath(`/presses/${pressId}`);
  revalidatePath("/dashboard");
  return { ok: true, message: values.intent === "delete" ? "Removed." : "Saved." };
}

export async function applyStartingPlanAction(pressId: string, _prev: ActionState, _form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const { user } = await requireShopContext();
  const refused = await run({}, () => applyStartingPlan({ userId: user.id }, pressId));
  if (refused) return refused;
  revalidatePath(`/presses/${pressId}`);
  revalidatePath("/dashboard");
  return { ok: true, message: "Starting plan added. Adjust each interval to your parts' manuals." };
}
