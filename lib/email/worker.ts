import "server-only";
import { isDatabaseUnavailable } from "@/lib/errors";
import { deliverDueEmails } from "./sender";

let timer: NodeJS.Timeout | null = null;
let running = false;

/**
 * Polls the outbox every EMAIL_POLL_MS (default 5 s) in this app instance; started once from
 * instrumentation.ts. A run never overlaps the previous one; an unreachable database is quiet.
 */
export function startEmailWorker(intervalMs = Number(process.env.EMAIL_POLL_MS || 5_000)): void {
  if (timer || process.env.EMAIL_WORKER === "0") return;
  timer = setInterval(() => {
    if (running) return;
    running = true;
    deliverDueEmails()
      .catch((error: unknown) => {
        if (!isDatabaseUnavailable(error)) console.error("[email] delivery run failed", error);
      })
      .finally(() => {
        running = false;
      });
  }, intervalMs);
  timer.unref();
}
