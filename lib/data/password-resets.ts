import "server-only";
import { and, asc, eq, gt, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { memberships, passwordResets, sessions, shops, users } from "@/db/schema";
import { newLinkToken, linkSecretMatches, parseLinkToken } from "@/lib/auth/link-token";
import { hashPassword } from "@/lib/auth/password";
import { normaliseEmail } from "@/lib/auth/sign-in";
import { enqueueEmail } from "@/lib/email/outbox";
import { appUrl } from "@/lib/app-url";
import { passwordResetEmail } from "@/lib/email/messages/password-reset";
import { recordAudit } from "./audit";
import type { Executor } from "./press-access";

/** A reset link lives this long (under an hour, as the brief asks). */
export const RESET_LIFETIME_MS = 30 * 60_000;
/** At most this many open links per account at once; more requests are quietly ignored. */
const MAX_OPEN_RESETS = 3;

/**
 * Queues a reset link for the address if an account has it. The caller answers the same either
 * way, so the form tells no one which addresses have accounts. Authorization: open (public form).
 */
export async function requestPasswordReset(emailInput: string, origin: string | null, now = new Date()): Promise<void> {
  const email = normaliseEmail(emailInput);
  await db.transaction(async (tx) => {
    const [user] = await tx.select({ id: users.id }).from(users).where(eq(users.email, email)).limit(1).for("update");
    if (!user) return;
    const open = await tx.$count(passwordResets, and(eq(passwordResets.userId, user.id), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, now)));
    if (open >= MAX_OPEN_RESETS) return;
    const [shop] = await tx
      .select({ name: shops.name })
      .from(memberships)
      .innerJoin(shops, eq(shops.id, memberships.shopId))
      .where(eq(memberships.userId, user.id))
      .orderBy(asc(shops.personal), asc(shops.name))
      .limit(1);
    const { id, token, secretHash } = newLinkToken();
    await tx.insert(passwordResets).values({ id, userId: user.id, secretHash, createdAt: now, expiresAt: new Date(now.getTime() + RESET_LIFETIME_MS) });
    const message = passwordResetEmail({ shopName: shop?.name ?? "Presswright", link: appUrl(`/reset-password/${token}`, origin), expiresInMinutes: RESET_LIFETIME_MS / 60_000 });
    await enqueueEmail(tx, { kind: "password-reset", to: email, ...message });
  });
}

export type ResetCheck = { ok: true; userId: string } | { ok: false; reason: "invalid" | "used" | "expired" };

async function checkReset(executor: Executor, token: string, now: Date, lock: boolean): Promise<ResetCheck> {
  const parsed = parseLinkToken(token);
  if (!parsed) return { ok: false, reason: "invalid" };
  const query = executor.select().from(passwordResets).where(eq(passwordResets.id, parsed.id)).limit(1);
  const [row] = lock ? await query.for("update") : await query;
  if (!row || !linkSecretMatches(parsed.secret, row.secretHash)) return { ok: false, reason: "invalid" };
  if (row.usedAt) return { ok: false, reason: "used" };
  if (row.expiresAt <= now) return { ok: false, reason: "expired" };
  return { ok: true, userId: row.userId };
}

/** Whether a reset link can still be used (for the page that shows the form). */
export async function checkPasswordResetToken(token: string, now = new Date()): Promise<ResetCheck> {
  return checkReset(db, token, now, false);
}

/**
 * Sets a new password through a reset link: the link is used up, every session of the account
 * ends, all in one transaction. Authorization: holding a valid, unused, unexpired link.
 */
export async function resetPassword(token: string, newPassword: string, now = new Date()): Promise<ResetCheck> {
  const passwordHash = await hashPassword(newPassword);
  const result = await db.transaction(async (tx) => {
    const check = await checkReset(tx, token, now, true);
    if (!check.ok) return check;
    await tx.update(passwordResets).set({ usedAt: now }).where(eq(passwordResets.id, parseLinkToken(token)!.id));
    await tx.update(users).set({ passwordHash }).where(eq(users.id, check.userId));
    await tx.delete(sessions).where(eq(sessions.userId, check.userId));
    return check;
  });
  if (result.ok) await recordAudit({ action: "password.reset", userId: result.userId });
  return result;
}
