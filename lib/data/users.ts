import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { memberships, shops, users } from "@/db/schema";
import { hashPassword } from "@/lib/auth/password";
import { createSession, invalidateUserSessions } from "@/lib/auth/session";
import { checkPasswordThrottled, normaliseEmail } from "@/lib/auth/sign-in";
import { newId } from "@/lib/ids";
import type { Actor } from "./actor";
import { recordAudit } from "./audit";

export class EmailTakenError extends Error {
  constructor() {
    super("An account with this e-mail already exists.");
    this.name = "EmailTakenError";
  }
}

/**
 * Creates the user, their personal shop and the manager membership in one transaction, so a
 * failure leaves nothing half-created. Authorization: open to anyone (sign-up).
 */
export async function createUserWithPersonalShop(input: {
  email: string;
  displayName: string;
  password: string;
}): Promise<{ userId: string; shopId: string }> {
  const email = normaliseEmail(input.email);
  const passwordHash = await hashPassword(input.password);
  const userId = newId();
  const shopId = newId();
  try {
    await db.transaction(async (tx) => {
      await tx.insert(users).values({
        id: userId,
        email,
        displayName: input.displayName.trim(),
        passwordHash,
        activeShopId: shopId,
      });
      await tx.insert(shops).values({ id: shopId, name: `${input.displayName.trim()}'s shop`, personal: true });
      await tx.insert(memberships).values({ shopId, userId, role: "manager" });
    });
  } catch (error) {
    if (isDuplicateKey(error)) throw new EmailTakenError();
    throw error;
  }
  await recordAudit({ action: "sign-up", userId, shopId });
  return { userId, shopId };
}

/** MariaDB's duplicate-key error (on the named key, when given), wherever it sits in the cause chain. */
export function isDuplicateKey(error: unknown, key?: string): boolean {
  let e: unknown = error;
  for (let depth = 0; e && depth < 4; depth++) {
    if ((e as { code?: string }).code === "ER_DUP_ENTRY") return !key || String((e as { message?: unknown }).message).includes(key);
    e = (e as { cause?: unknown }).cause;
  }
  return false;
}


export type PasswordChangeResult =
  | { ok: true; token: string }
  | { ok: false; reason: "wrong-current" }
  | { ok: false; reason: "throttled"; retryAfterS: number };

/**
 * Changes the actor's own password after checking the current one, ends every session of the
 * user (ASVS 7.4.3) and opens a fresh one for the caller. Authorization: the actor only.
 */
export async function changePassword(
  actor: Actor,
  input: { currentPassword: string; newPassword: string; ip: string },
): Promise<PasswordChangeResult> {
  const [user] = await db
    .select({ id: users.id, email: users.email, passwordHash: users.passwordHash })
    .from(users)
    .where(eq(users.id, actor.userId))
    .limit(1);
  if (!user) return { ok: false, reason: "wrong-current" };
  // Same throttle as sign-in: a stolen session must not allow unlimited guesses.
  const check = await checkPasswordThrottled({ email: user.email, ip: input.ip, password: input.currentPassword, user, action: "password.confirm" });
  if (!check.ok) return check.reason === "throttled" ? check : { ok: false, reason: "wrong-current" };
  const passwordHash = await hashPassword(input.newPassword);
  await db.update(users).set({ passwordHash }).where(eq(users.id, actor.userId));
  await invalidateUserSessions(actor.userId);
  const { token } = await createSession(actor.userId);
  await recordAudit({ action: "password.changed", userId: actor.userId, ip: input.ip });
  return { ok: true, token };
}

/** Saves the actor's unit preference. Authorization: the actor only. */
export async function updateUnitSystem(actor: Actor, unitSystem: "metric" | "imperial"): Promise<void> {
  await db.update(users).set({ unitSystem }).where(eq(users.id, actor.userId));
}
