import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { sessions, users } from "@/db/schema";
import { generateSessionToken, parseSessionToken, secretMatches } from "./session-token";

/** Sign-out after this long without a request. */
export const INACTIVITY_TIMEOUT_MS = 1000 * 60 * 60 * 24 * 7;
/** Sign-out this long after sign-in, however active. */
export const ABSOLUTE_LIFETIME_MS = 1000 * 60 * 60 * 24 * 30;
/** Refresh last_verified_at at most this often, to spare a write on every request. */
const ACTIVITY_WRITE_INTERVAL_MS = 1000 * 60 * 60;

export type SessionUser = {
  id: string;
  email: string;
  displayName: string;
  unitSystem: "metric" | "imperial";
  activeShopId: string | null;
};

export type ValidSession = { id: string; userId: string; createdAt: Date; expiresAt: Date };

export async function createSession(userId: string, now = new Date()): Promise<{ token: string; session: ValidSession }> {
  const { id, token, secretHash } = generateSessionToken();
  await db.insert(sessions).values({ id, secretHash, userId, createdAt: now, lastVerifiedAt: now });
  return { token, session: { id, userId, createdAt: now, expiresAt: expiryOf(now, now) } };
}

function expiryOf(createdAt: Date, lastVerifiedAt: Date): Date {
  const inactive = lastVerifiedAt.getTime() + INACTIVITY_TIMEOUT_MS;
  const absolute = createdAt.getTime() + ABSOLUTE_LIFETIME_MS;
  return new Date(Math.min(inactive, absolute));
}

/** Checks a cookie value; returns the session and its user, or null (and deletes an expired session). */
export async function validateSessionToken(
  token: string,
  now = new Date(),
): Promise<{ session: ValidSession; user: SessionUser } | null> {
  const parsed = parseSessionToken(token);
  if (!parsed) return null;
  const [row] = await db
    .select({
      id: sessions.id,
      secretHash: sessions.secretHash,
      createdAt: sessions.createdAt,
      lastVerifiedAt: sessions.lastVerifiedAt,
      user: {
        id: users.id,
        email: users.email,
        displayName: users.displayName,
        unitSystem: users.unitSystem,
        activeShopId: users.activeShopId,
      },
    })
    .from(sessions)
    .innerJoin(users, eq(users.id, sessions.userId))
    .where(eq(sessions.id, parsed.id))
    .limit(1);
  if (!row || !secretMatches(parsed.secret, row.secretHash)) return null;

  let expiresAt = expiryOf(row.createdAt, row.lastVerifiedAt);
  if (now >= expiresAt) {
    await db.delete(sessions).where(eq(sessions.id, row.id));
    return null;
  }
  if (now.getTime() - row.lastVerifiedAt.getTime() >= ACTIVITY_WRITE_INTERVAL_MS) {
    await db.update(sessions).set({ lastVerifiedAt: now }).where(eq(sessions.id, row.id));
    expiresAt = expiryOf(row.createdAt, now);
  }
  return {
    session: { id: row.id, userId: row.user.id, createdAt: row.createdAt, expiresAt },
    user: row.user,
  };
}

export async function invalidateSession(sessionId: string): Promise<void> {
  await db.delete(sessions).where(eq(sessions.id, sessionId));
}

/** Ends every session of a user (on a password change, ASVS 7.4.3). */
export async function invalidateUserSessions(userId: string): Promise<void> {
  await db.delete(sessions).where(eq(sessions.userId, userId));
}
