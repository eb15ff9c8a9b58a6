"use server";

import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { z } from "zod";
import { refusalState } from "@/lib/action-refusal";
import { echoValues, type ActionState } from "@/lib/action-state";
import { assertSameOriginAction, clearSessionCookie } from "@/lib/auth/action-guard";
import { getCurrentSession, requireShopContext } from "@/lib/auth/current";
import { invalidateSession } from "@/lib/auth/session";
import { startInspection } from "@/lib/data/inspections";
import { ID_PATTERN } from "@/lib/ids";
import { startInspectionSchema } from "@/lib/validation/inspection";

const pressIdSchema = z.string().regex(ID_PATTERN, "Choose a press.");

/** Starts a run from the chosen checklist and opens it. */
export async function startInspectionAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const { user } = await requireShopContext();
  const values = echoValues(form);
  const pressId = pressIdSchema.safeParse(form.get("pressId"));
  const input = startInspectionSchema.safeParse({ templateId: form.get("templateId") });
  if (!pressId.success || !input.success) {
    return { ok: false, fieldErrors: { pressId: pressId.error?.issues.map((i) => i.message), templateId: input.error ? ["Choose a checklist."] : undefined }, values };
  }
  let id: string;
  try {
    ({ id } = await startInspection({ userId: user.id }, pressId.data, input.data.templateId));
  } catch (error) {
    return refusalState(error, values, "Your role in this shop cannot run that checklist.");
  }
  revalidatePath("/inspections");
  redirect(`/inspections/${id}/run`);
}

/**
 * Signing needs a recent sign-in: end this session and come back to the run after signing in.
 * The answers stay in the browser's queue meanwhile. Only our own plain path goes into `next`.
 */
export async function reauthenticateForSigningAction(inspectionId: string): Promise<void> {
  await assertSameOriginAction();
  const current = await getCurrentSession();
  if (current) await invalidateSession(current.session.id);
  await clearSessionCookie();
  const next = ID_PATTERN.test(inspectionId) ? `/inspections/${inspectionId}/run` : "/inspections";
  redirect(`/sign-in?next=${encodeURIComponent(next)}`);
}
