import "server-only";
import { BusyError, ConflictError } from "@/lib/errors";

// MariaDB errors that mean "another transaction got in the way; running again may succeed":
// 1213 deadlock, 1205 lock wait timeout, 1020 record changed since last read (snapshot isolation).
const RETRYABLE = new Set([1213, 1205, 1020]);
const ATTEMPTS = 5;

function errno(error: unknown): number | null {
  for (let e: unknown = error, depth = 0; e && depth < 5; depth++, e = (e as { cause?: unknown }).cause) {
    const n = (e as { errno?: unknown }).errno;
    if (typeof n === "number") return n;
  }
  return null;
}

/**
 * Runs a whole transaction again when MariaDB aborts it for a deadlock, lock wait or snapshot
 * conflict, with a short random back-off. When every attempt fails: a lock wait → BusyError (503),
 * anything else → ConflictError (409) — never a 500.
 */
export async function withRetry<T>(work: () => Promise<T>): Promise<T> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await work();
    } catch (error) {
      const code = errno(error);
      if (code === null || !RETRYABLE.has(code)) throw error;
      if (attempt >= ATTEMPTS) {
        if (code === 1205) throw new BusyError();
        throw new ConflictError("Someone else changed this at the same moment. Please try again.");
      }
      await new Promise((resolve) => setTimeout(resolve, Math.random() * 20 * attempt));
    }
  }
}
