"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { requestOrigin } from "@/app/(public)/email-link-actions";
import { refusalState } from "@/lib/action-refusal";
import { echoValues, type ActionState } from "@/lib/action-state";
import { assertSameOriginAction } from "@/lib/auth/action-guard";
import { requireShopContext } from "@/lib/auth/current";
import { createInvitation, resendInvitation, revokeInvitation } from "@/lib/data/invitations";
import { invitationInputSchema } from "@/lib/validation/email-links";

export async function inviteAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const { user, shop } = await requireShopContext();
  const values = echoValues(form);
  const parsed = invitationInputSchema.safeParse({ email: form.get("email"), role: form.get("role") });
  if (!parsed.success) return { ok: false, message: "Please fix the marked fields.", fieldErrors: z.flattenError(parsed.error).fieldErrors, values };
  try {
    await createInvitation({ userId: user.id }, shop.id, parsed.data, await requestOrigin());
  } catch (error) {
    return refusalState(error, values);
  }
  revalidatePath("/shop");
  return { ok: true, message: `Invitation queued for ${parsed.data.email}.` };
}

export async function invitationCommandAction(invitationId: string, _prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const { user } = await requireShopContext();
  const resend = form.get("intent") === "resend";
  try {
    if (resend) await resendInvitation({ userId: user.id }, invitationId, await requestOrigin());
    else await revokeInvitation({ userId: user.id }, invitationId);
  } catch (error) {
    return refusalState(error, {});
  }
  revalidatePath("/shop");
  return { ok: true, message: resend ? "Sent again with a new link." : "Withdrawn." };
}
