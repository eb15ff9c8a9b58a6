import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { users } from "@/db/schema";
import { recordAudit } from "@/lib/data/audit";
import { hashPassword, needsRehash, timingDummyHash, verifyPassword } from "./password";
import { createSession } from "./session";
import { clearFailures, recordFailure, secondsLocked, type Subject } from "./throttle";

export type SignInResult =
  | { ok: true; userId: string; token: string }
  | { ok: false; reason: "invalid" }
  | { ok: false; reason: "throttled"; retryAfterS: number };

export function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}

/**
 * Checks credentials with throttling per account and per IP. Unknown e-mail and wrong password
 * give the same answer and take the same time (a dummy hash is verified for unknown e-mails).
 */
export async function attemptSignIn(input: { email: string; password: string; ip: string }): Promise<SignInResult> {
  const email = normaliseEmail(input.email);
  const subjects: Subject[] = [
    { scope: "account", subject: email.slice(0, 254) },
    { scope: "ip", subject: input.ip },
  ];
  const wait = await secondsLocked(subjects);
  if (wait > 0) {
    await recordAudit({ action: "sign-in.throttled", ip: input.ip, detail: { email } });
    return { ok: false, reason: "throttled", retryAfterS: wait };
  }

  const [user] = await db
    .select({ id: users.id, passwordHash: users.passwordHash })
    .from(users)
    .where(eq(users.email, email))
    .limit(1);
  const valid = await verifyPassword(user?.passwordHash ?? (await timingDummyHash()), input.password);
  if (!user || !valid) {
    await recordFailure(subjects);
    await recordAudit({ action: "sign-in.failed", userId: user?.id ?? null, ip: input.ip, detail: { email } });
    return { ok: false, reason: "invalid" };
  }

  await clearFailures(subjects[0]!);
  if (needsRehash(user.passwordHash)) {
    await db.update(users).set({ passwordHash: await hashPassword(input.password) }).where(eq(users.id, user.id));
  }
  const { token } = await createSession(user.id);
  await recordAudit({ action: "sign-in", userId: user.id, ip: input.ip });
  return { ok: true, userId: user.id, token };
}
