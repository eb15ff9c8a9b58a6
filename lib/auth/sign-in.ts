import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { users } from "@/db/schema";
import { recordAudit } from "@/lib/data/audit";
import { hashPassword, needsRehash, timingDummyHash, verifyPassword } from "./password";
import { createSession } from "./session";
import { clearFailures, recordFailure, secondsLocked, type Subject } from "./throttle";

export type PasswordCheck =
  | { ok: true }
  | { ok: false; reason: "invalid" }
  | { ok: false; reason: "throttled"; retryAfterS: number };

export type SignInResult =
  | { ok: true; userId: string; token: string }
  | { ok: false; reason: "invalid" }
  | { ok: false; reason: "throttled"; retryAfterS: number };

export function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}

/**
 * The one check of a password against an account, for sign-in and for every "confirm your current
 * password" step (change password, re-authentication): throttled per account and per IP with the
 * same counters, so a stolen session gives no more guesses than the sign-in form. An absent user
 * is checked against a dummy hash, so it takes the same time and counts the same way.
 */
export async function checkPasswordThrottled(input: {
  email: string;
  ip: string;
  password: string;
  user: { id: string; passwordHash: string } | null;
  /** Audit action prefix, e.g. "sign-in" or "password.confirm". */
  action: string;
}): Promise<PasswordCheck> {
  const email = normaliseEmail(input.email);
  const subjects: Subject[] = [
    { scope: "account", subject: email.slice(0, 254) },
    { scope: "ip", subject: input.ip },
  ];
  const userId = input.user?.id ?? null;
  const wait = await secondsLocked(subjects);
  if (wait > 0) {
    await recordAudit({ action: `${input.action}.throttled`, userId, ip: input.ip, detail: { email } });
    return { ok: false, reason: "throttled", retryAfterS: wait };
  }
  const valid = await verifyPassword(input.user?.passwordHash ?? (await timingDummyHash()), input.password);
  if (!input.user || !valid) {
    await recordFailure(subjects);
    await recordAudit({ action: `${input.action}.failed`, userId, ip: input.ip, detail: { email } });
    return { ok: false, reason: "invalid" };
  }
  await clearFailures(subjects[0]!);
  return { ok: true };
}

/**
 * Checks credentials with throttling per account and per IP. Unknown e-mail and wrong password
 * give the same answer and take the same time (a dummy hash is verified for unknown e-mails).
 */
export async function attemptSignIn(input: { email: string; password: string; ip: string }): Promise<SignInResult> {
  const email = normaliseEmail(input.email);
  const [user] = await db
    .select({ id: users.id, passwordHash: users.passwordHash })
    .from(users)
    .where(eq(users.email, email))
    .limit(1);
  const check = await checkPasswordThrottled({ email, ip: input.ip, password: input.password, user: user ?? null, action: "sign-in" });
  if (!check.ok || !user) return check.ok ? { ok: false, reason: "invalid" } : check;

  if (needsRehash(user.passwordHash)) {
    await db.update(users).set({ passwordHash: await hashPassword(input.password) }).where(eq(users.id, user.id));
  }
  const { token } = await createSession(user.id);
  await recordAudit({ action: "sign-in", userId: user.id, ip: input.ip });
  return { ok: true, userId: user.id, token };
}
