"use server";

import { revalidatePath } from "next/cache";
import { refusalState } from "@/lib/action-refusal";
import type { ActionState } from "@/lib/action-state";
import { assertSameOriginAction } from "@/lib/auth/action-guard";
import { requireShopContext } from "@/lib/auth/current";
import { updateTemplate } from "@/lib/data/inspection-templates";
import { templateInputSchema } from "@/lib/validation/inspection";

function parseJson(text: FormDataEntryValue | null): unknown {
  try {
    return typeof text === "string" ? JSON.parse(text) : null;
  } catch {
    return null;
  }
}

/** Saves a checklist from the editor (one JSON field, checked by the same schema as the API). */
export async function saveTemplateAction(templateId: string, _prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const { user } = await requireShopContext();
  const parsed = templateInputSchema.safeParse(parseJson(form.get("template")));
  if (!parsed.success) {
    const fieldErrors: Record<string, string[]> = {};
    for (const issue of parsed.error.issues) (fieldErrors[issue.path.join(".") || "template"] ??= []).push(issue.message);
    return { ok: false, message: `Please fix the checklist: ${parsed.error.issues[0]?.message ?? ""}`, fieldErrors };
  }
  try {
    await updateTemplate({ userId: user.id }, templateId, parsed.data);
  } catch (error) {
    return refusalState(error, {}, "Only a manager can change checklists.");
  }
  revalidatePath("/inspections/templates");
  return { ok: true, message: "Checklist saved. Inspections already started keep their own copy." };
}
