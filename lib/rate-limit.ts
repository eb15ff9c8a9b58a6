import "server-only";
import { and, eq, lt, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { rateLimitWindows } from "@/db/schema";

/**
 * Fixed-window request limits kept in MariaDB, so every app instance counts against the same
 * numbers and a restart does not reset them. One row per (bucket, window); the increment is a
 * single atomic upsert, read back afterwards.
 */
export interface RateLimitPolicy {
  /** Prefix of the bucket, e.g. "sizing-api". */
  name: string;
  /** Requests allowed per window. */
  limit: number;
  windowMs: number;
}

export interface RateLimitResult {
  allowed: boolean;
  limit: number;
  remaining: number;
  /** Seconds until the window closes (at least 1): the Retry-After of a refusal. */
  retryAfterS: number;
  resetAt: Date;
}

/** The public sizing API: generous for a person or a script, a wall for a flood. */
export const SIZING_API_LIMIT: RateLimitPolicy = { name: "sizing-api", limit: 120, windowMs: 60_000 };

/**
 * Sign-up, per address and per client IP: the form answers the same whether or not an address has
 * an account, and these keep it from being used to mail an address's owner (or to create
 * accounts) in bulk.
 */
export const SIGN_UP_ADDRESS_LIMIT: RateLimitPolicy = { name: "sign-up-address", limit: 5, windowMs: 60 * 60_000 };
export const SIGN_UP_IP_LIMIT: RateLimitPolicy = { name: "sign-up-ip", limit: 30, windowMs: 60 * 60_000 };
/** Password-reset requests per client address: enough for a typo or two, not for probing addresses. */
export const PASSWORD_RESET_LIMIT: RateLimitPolicy = { name: "password-reset", limit: 5, windowMs: 15 * 60_000 };

/** Rows of windows that ended this long ago are swept now and then. */
const KEEP_MS = 60 * 60 * 1000;
/** Share of new windows that also sweep other buckets' stale rows (the sweep scans the table). */
const SWEEP_CHANCE = 0.01;

/** Counts one request of `subject` (e.g. a client IP) and says whether it is within the policy. */
export async function hitRateLimit(policy: RateLimitPolicy, subject: string, now = new Date()): Promise<RateLimitResult> {
  const bucket = `${policy.name}:${subject}`.slice(0, 128);
  const windowStart = new Date(Math.floor(now.getTime() / policy.windowMs) * policy.windowMs);
  const here = and(eq(rateLimitWindows.bucket, bucket), eq(rateLimitWindows.windowStart, windowStart));

  await db
    .insert(rateLimitWindows)
    .values({ bucket, windowStart, hits: 1 })
    .onDuplicateKeyUpdate({ set: { hits: sql`${rateLimitWindows.hits} + 1` } });
  // Concurrent requests may have added theirs too; counting them errs on the side of refusing.
  const [row] = await db.select({ hits: rateLimitWindows.hits }).from(rateLimitWindows).where(here);
  const hits = row?.hits ?? 1;

  if (hits === 1) await forgetOldWindows(bucket, windowStart, now);

  const resetAt = new Date(windowStart.getTime() + policy.windowMs);
  return {
    allowed: hits <= policy.limit,
    limit: policy.limit,
    remaining: Math.max(0, policy.limit - hits),
    retryAfterS: Math.max(1, Math.ceil((resetAt.getTime() - now.getTime()) / 1000)),
    resetAt,
  };
}

/** A new window opened: drop this bucket's earlier rows (a primary-key range) and sometimes everyone's stale rows. */
async function forgetOldWindows(bucket: string, windowStart: Date, now: Date): Promise<void> {
  await db
    .delete(rateLimitWindows)
    .where(and(eq(rateLimitWindows.bucket, bucket), lt(rateLimitWindows.windowStart, windowStart)));
  if (Math.random() < SWEEP_CHANCE) {
    await db.delete(rateLimitWindows).where(lt(rateLimitWindows.windowStart, new Date(now.getTime() - KEEP_MS)));
  }
}
