"use server";

import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { echoValues, type ActionState } from "@/lib/action-state";
import { assertSameOriginAction } from "@/lib/auth/action-guard";
import { requireShopContext } from "@/lib/auth/current";
import { ForbiddenError } from "@/lib/auth/permissions";
import { createPlannedPressFromSizing } from "@/lib/data/presses";
import { plannedPressSchema } from "@/lib/validation/planned-press";
import { fieldErrorsOf } from "@/lib/validation/field-errors";

/** Saves the calculator's current input as a planned press in the user's working shop. */
export async function savePlannedPressAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const { user, shop } = await requireShopContext();
  // The sizing JSON is re-sent from the calculator on every submit; echo only what the user typed.
  const values = echoValues(form, ["sizingInput"]);
  const parsed = plannedPressSchema.safeParse({
    name: form.get("name"),
    frameType: form.get("frameType"),
    sizingInput: form.get("sizingInput"),
  });
  if (!parsed.success) {
    return { ok: false, message: "Please fix the marked fields.", fieldErrors: fieldErrorsOf(parsed.error.issues), values };
  }
  let id: string;
  try {
    ({ id } = await createPlannedPressFromSizing({ userId: user.id }, shop.id, {
      name: parsed.data.name,
      frameType: parsed.data.frameType,
      input: parsed.data.sizingInput,
    }));
  } catch (error) {
    if (error instanceof ForbiddenError) {
      return {
        ok: false,
        message: `Only a manager of ${shop.name} can add presses to it. Ask a manager, or switch to your own shop to save this plan there.`,
        values,
      };
    }
    throw error;
  }
  revalidatePath("/dashboard");
  revalidatePath("/presses");
  redirect(`/presses/${id}`);
}
