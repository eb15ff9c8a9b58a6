import "server-only";
import { createHash } from "node:crypto";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { users } from "@/db/schema";
import { normaliseEmail } from "@/lib/auth/sign-in";
import { enqueueEmail } from "@/lib/email/outbox";
import { signUpAttemptEmail } from "@/lib/email/sign-up-attempt";
import { hitRateLimit, SIGN_UP_ADDRESS_LIMIT, SIGN_UP_IP_LIMIT } from "@/lib/rate-limit";
import { recordAudit } from "./audit";
import { createUserWithPersonalShop, EmailTakenError } from "./users";

export type SignUpResult = { ok: true } | { ok: false; reason: "throttled"; retryAfterS: number };

/** Rate-limit buckets and dedupe keys name an address by its hash, never in clear. */
const addressDigest = (email: string): string => createHash("sha256").update(email).digest("hex");

/**
 * Sign-up that tells the caller nothing about which addresses have accounts: a new address gets
 * its account (the caller then signs in), a taken one gets nothing created and its owner an
 * e-mail ("someone tried to create an account with your address") through the outbox — and the
 * caller sees the same result either way. Limited per address and per IP in MariaDB (the limits
 * apply before the address is looked up, so they are the same for both). Open to anyone.
 */
export async function requestAccount(input: { email: string; displayName: string; password: string }, ip: string, now = new Date()): Promise<SignUpResult> {
  const email = normaliseEmail(input.email);
  const digest = addressDigest(email);
  const limits = await Promise.all([hitRateLimit(SIGN_UP_ADDRESS_LIMIT, digest, now), hitRateLimit(SIGN_UP_IP_LIMIT, ip, now)]);
  const refused = limits.filter((l) => !l.allowed);
  if (refused.length > 0) return { ok: false, reason: "throttled", retryAfterS: Math.max(...refused.map((l) => l.retryAfterS)) };

  try {
    // Hashes the password before it finds the address taken, so both paths cost the same.
    await createUserWithPersonalShop({ ...input, email });
  } catch (error) {
    if (!(error instanceof EmailTakenError)) throw error;
    await tellAddressOwner(email, digest, ip, now);
  }
  return { ok: true };
}

async function tellAddressOwner(email: string, digest: string, ip: string, now: Date): Promise<void> {
  const [owner] = await db.select({ id: users.id, displayName: users.displayName }).from(users).where(eq(users.email, email)).limit(1);
  if (!owner) return;
  const appUrl = process.env.APP_URL?.replace(/\/+$/, "");
  const message = signUpAttemptEmail({ displayName: owner.displayName, signInUrl: appUrl ? `${appUrl}/sign-in` : null });
  // At most one such message per address per hour, however often the form is tried.
  const hour = Math.floor(now.getTime() / 3_600_000);
  await db.transaction(async (tx) => {
    await enqueueEmail(tx, { kind: "sign-up-attempt", to: email, ...message, dedupeKey: `sign-up-attempt:${digest}:${hour}` });
  });
  await recordAudit({ action: "sign-up.address-taken", userId: owner.id, ip });
}
