"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { refusalState } from "@/lib/action-refusal";
import { echoValues, type ActionState } from "@/lib/action-state";
import { assertSameOriginAction } from "@/lib/auth/action-guard";
import { requireShopContext } from "@/lib/auth/current";
import { clearTagOut, tagOutPressByHand } from "@/lib/data/press-tag-outs";
import { tagOutReasonSchema } from "@/lib/validation/inspection";

async function withReason(form: FormData, work: (userId: string, reason: string) => Promise<string>): Promise<ActionState> {
  await assertSameOriginAction();
  const { user } = await requireShopContext();
  const values = echoValues(form);
  const parsed = tagOutReasonSchema.safeParse({ reason: form.get("reason") ?? "" });
  if (!parsed.success) return { ok: false, fieldErrors: z.flattenError(parsed.error).fieldErrors, values };
  try {
    return { ok: true, message: await work(user.id, parsed.data.reason) };
  } catch (error) {
    return refusalState(error, values, "Only a manager or an inspector can do this.");
  }
}

/** Tags the press out by hand, with the reason recorded. */
export async function tagOutAction(pressId: string, _prev: ActionState, form: FormData): Promise<ActionState> {
  return withReason(form, async (userId, reason) => {
    await tagOutPressByHand({ userId }, pressId, reason);
    revalidatePath(`/presses/${pressId}`);
    return "The press is tagged out.";
  });
}

/** Clears one tag-out with the reason recorded. */
export async function clearTagOutAction(tagOutId: string, _prev: ActionState, form: FormData): Promise<ActionState> {
  return withReason(form, async (userId, reason) => {
    const { pressId } = await clearTagOut({ userId }, tagOutId, reason);
    revalidatePath(`/presses/${pressId}`);
    return "Tag-out cleared.";
  });
}
