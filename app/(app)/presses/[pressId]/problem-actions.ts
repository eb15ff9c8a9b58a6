"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { refusalState } from "@/lib/action-refusal";
import { echoValues, type ActionState } from "@/lib/action-state";
import { assertSameOriginAction } from "@/lib/auth/action-guard";
import { requireShopContext } from "@/lib/auth/current";
import { closeProblem, reportProblem } from "@/lib/data/problems";
import { problemCloseSchema, problemInputSchema } from "@/lib/validation/shop-use";
import { revalidateSignedInPages } from "@/lib/revalidate";

/** Reports a problem; "stop use" tags the press out at once. Any member of the shop. */
export async function reportProblemAction(pressId: string, _prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const { user } = await requireShopContext();
  const values = echoValues(form);
  const parsed = problemInputSchema.safeParse({ description: values.description ?? "", severity: values.severity, stopUse: values.stopUse === "on" });
  if (!parsed.success) return { ok: false, message: "Please fix the marked fields.", fieldErrors: z.flattenError(parsed.error).fieldErrors, values };
  let id: string;
  try {
    ({ id } = await reportProblem({ userId: user.id }, pressId, parsed.data));
  } catch (error) {
    return refusalState(error, values);
  }
  revalidateSignedInPages();
  // The new report's id lets the form offer a photo upload for it.
  const message = parsed.data.stopUse ? "Reported. The press is tagged out and the managers have been told." : "Reported. Thank you.";
  return { ok: true, message, values: { problemId: id } };
}

/** Closes a report with a service-log entry id or a reason; clears its tag-out. Managers and inspectors. */
export async function closeProblemAction(pressId: string, problemId: string, _prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const { user } = await requireShopContext();
  const values = echoValues(form);
  const parsed = problemCloseSchema.safeParse({ close: true, reason: values.reason || undefined, serviceEntryId: values.serviceEntryId || undefined });
  if (!parsed.success) return { ok: false, message: "Please fix the marked fields.", fieldErrors: z.flattenError(parsed.error).fieldErrors, values };
  try {
    await closeProblem({ userId: user.id }, problemId, parsed.data);
  } catch (error) {
    return refusalState(error, values, "Only a manager or inspector can close a problem report.");
  }
  revalidatePath(`/presses/${pressId}`);
  return { ok: true, message: "Problem report closed." };
}
