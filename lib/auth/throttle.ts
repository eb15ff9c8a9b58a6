import "server-only";
import { and, eq, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { loginThrottle } from "@/db/schema";
import { LIMITS, waitAfter, type Subject } from "./throttle-policy";

export { LIMITS, waitAfter, type Subject };

/**
 * Sign-in throttling, stored in MariaDB so it survives restarts and holds across app instances.
 * After FREE failures in a row a subject is locked for a wait that doubles with each further
 * failure (capped); a success for an account clears that account's counter.
 */

/** Failures older than this no longer count towards a lock. */
const FORGET_AFTER_MS = 1000 * 60 * 60 * 24;

/** Seconds the caller must still wait, the longest over the given subjects; 0 when free to try. */
export async function secondsLocked(subjects: Subject[], now = new Date()): Promise<number> {
  let longest = 0;
  for (const s of subjects) {
    const [row] = await db
      .select({ lockedUntil: loginThrottle.lockedUntil })
      .from(loginThrottle)
      .where(and(eq(loginThrottle.scope, s.scope), eq(loginThrottle.subject, s.subject)));
    if (row?.lockedUntil && row.lockedUntil > now) {
      longest = Math.max(longest, Math.ceil((row.lockedUntil.getTime() - now.getTime()) / 1000));
    }
  }
  return longest;
}

/** Counts one failure against each subject, atomically, and sets the lock when the limit is passed. */
export async function recordFailure(subjects: Subject[], now = new Date()): Promise<void> {
  const forgetBefore = new Date(now.getTime() - FORGET_AFTER_MS);
  for (const s of subjects) {
    await db.transaction(async (tx) => {
      await tx
        .insert(loginThrottle)
        .values({ scope: s.scope, subject: s.subject, failures: 1, lastFailureAt: now })
        .onDuplicateKeyUpdate({
          set: {
            failures: sql`IF(${loginThrottle.lastFailureAt} < ${forgetBefore}, 1, ${loginThrottle.failures} + 1)`,
            lastFailureAt: now,
          },
        });
      const [row] = await tx
        .select({ failures: loginThrottle.failures })
        .from(loginThrottle)
        .where(and(eq(loginThrottle.scope, s.scope), eq(loginThrottle.subject, s.subject)));
      const wait = waitAfter(s.scope, row?.failures ?? 0);
      if (wait > 0) {
        await tx
          .update(loginThrottle)
          .set({ lockedUntil: new Date(now.getTime() + wait * 1000) })
          .where(and(eq(loginThrottle.scope, s.scope), eq(loginThrottle.subject, s.subject)));
      }
    });
  }
}

export async function clearFailures(subject: Subject): Promise<void> {
  await db
    .delete(loginThrottle)
    .where(and(eq(loginThrottle.scope, subject.scope), eq(loginThrottle.subject, subject.subject)));
}
