import { describe, expect, it } from "vitest";
import { withRetry } from "@/lib/data/retry";
import { BusyError, ConflictError } from "@/lib/errors";

// MariaDB error numbers from its manual: 1213 ER_LOCK_DEADLOCK, 1205 ER_LOCK_WAIT_TIMEOUT, 1020 ER_CHECKREAD.
const dbError = (errno: number): Error => Object.assign(new Error(`errno ${errno}`), { errno });

describe("withRetry", () => {
  it("runs the work again after a deadlock and returns its result", async () => {
    let calls = 0;
    await expect(withRetry(async () => (++calls < 3 ? Promise.reject(dbError(1213)) : "done"))).resolves.toBe("done");
    expect(calls).toBe(3);
  });

  it("finds the error number under a wrapper's cause", async () => {
    let calls = 0;
    await withRetry(async () => {
      if (++calls === 1) throw new Error("Failed query", { cause: dbError(1020) });
    });
    expect(calls).toBe(2);
  });

  it("answers 409 after repeated deadlocks or snapshot conflicts and 503 after lock waits, never the raw error", async () => {
    await expect(withRetry(() => Promise.reject(dbError(1213)))).rejects.toBeInstanceOf(ConflictError);
    await expect(withRetry(() => Promise.reject(dbError(1020)))).rejects.toBeInstanceOf(ConflictError);
    await expect(withRetry(() => Promise.reject(dbError(1205)))).rejects.toBeInstanceOf(BusyError);
  });

  it("passes other errors straight through without retrying", async () => {
    let calls = 0;
    const other = dbError(1062);
    await expect(
      withRetry(async () => {
        calls++;
        throw other;
      }),
    ).rejects.toBe(other);
    expect(calls).toBe(1);
  });
});
