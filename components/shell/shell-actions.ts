"use server";

import { notFound, redirect } from "next/navigation";
import { assertSameOriginAction, clearSessionCookie } from "@/lib/auth/action-guard";
import { getCurrentSession, requireSignedIn } from "@/lib/auth/current";
import { NotFoundError } from "@/lib/auth/permissions";
import { invalidateSession } from "@/lib/auth/session";
import { revalidateSignedInPages } from "@/lib/revalidate";
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
  if (typeof shopId !== "string") notFound();
  try {
    await switchActiveShop({ userId: user.id }, shopId);
  } catch (error) {
    // A shop the user is not in (or a made-up id) is not found, not a server error.
    if (error instanceof NotFoundError) notFound();
    throw error;
  }
  revalidateSignedInPages();
  redirect("/dashboard");
}
