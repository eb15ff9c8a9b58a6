"use server";

import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { assertSameOriginAction, clearSessionCookie } from "@/lib/auth/action-guard";
import { getCurrentSession, requireSignedIn } from "@/lib/auth/current";
import { invalidateSession } from "@/lib/auth/session";
import { recordAudit } from "@/lib/data/audit";
import { switchActiveShop } from "@/lib/data/shops";

export async function signOutAction(): Promise<void> {
  await assertSameOriginAction();
  const current = await getCurrentSession();
  if (current) {
    await invalidateSession(current.session.id);
    await recordAudit({ action: "sign-out", userId: current.user.id });
  }
  await clearSessionCookie();
  redirect("/sign-in");
}

export async function switchShopAction(form: FormData): Promise<void> {
  await assertSameOriginAction();
  const { user } = await requireSignedIn();
  const shopId = form.get("shopId");
  if (typeof shopId === "string") await switchActiveShop({ userId: user.id }, shopId);
  revalidatePath("/", "layout");
  redirect("/dashboard");
}
