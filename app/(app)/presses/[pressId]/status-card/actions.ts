"use server";

import { revalidatePath } from "next/cache";
import { refusalState } from "@/lib/action-refusal";
import type { ActionState } from "@/lib/action-state";
import { assertSameOriginAction } from "@/lib/auth/action-guard";
import { requireShopContext } from "@/lib/auth/current";
import { regenerateStatusToken } from "@/lib/data/status-page";

/** Replaces the status-page link; printed cards with the old QR code stop working. Managers only. */
export async function regenerateStatusLinkAction(pressId: string, _prev: ActionState): Promise<ActionState> {
  await assertSameOriginAction();
  const { user } = await requireShopContext();
  try {
    await regenerateStatusToken({ userId: user.id }, pressId);
  } catch (error) {
    return refusalState(error, {}, "Only a manager can replace the link.");
  }
  revalidatePath(`/presses/${pressId}/status-card`);
  return { ok: true, message: "New link made. Print the card again and replace the old one on the press." };
}
