import "server-only";
import { and, asc, eq, inArray, lte } from "drizzle-orm";
import type { Transporter } from "nodemailer";
import { db } from "@/db/client";
import { emailOutbox } from "@/db/schema";
import { smtpSettings, smtpTransport } from "./transport";

/** After this many failed attempts a message is marked failed and left for a person to look at. */
export const MAX_ATTEMPTS = 8;
/** How long a claimed message is hidden from other senders while this one delivers it. */
const CLAIM_LEASE_MS = 2 * 60_000;

/** Exponential back-off: 30 s, 1 min, 2 min … capped at 1 h. */
export function retryDelayMs(attempts: number): number {
  return Math.min(60 * 60_000, 30_000 * 2 ** Math.max(0, attempts - 1));
}

/** An SMTP error as a short line without credentials or message content. */
export function describeSmtpError(error: unknown): string {
  const e = error as { code?: string; responseCode?: number; command?: string; message?: string };
  const parts = [e.code, e.responseCode ? String(e.responseCode) : null, e.command].filter(Boolean).join(" ");
  const message = (e.message ?? String(error)).replace(/(auth|pass(word)?|user)[^\s]*\s*[:=]\s*\S+/gi, "$1=…");
  return `${parts ? `${parts}: ` : ""}${message}`.slice(0, 500);
}

export type DeliveryReport = { claimed: number; sent: number; retrying: number; failed: number };

/**
 * Delivers due outbox rows. Claiming is a short transaction with `FOR UPDATE SKIP LOCKED` that
 * pushes the rows' next attempt past a lease, so several app instances never send one message
 * twice at once; each message then goes out on its own, and a failure schedules a retry with
 * back-off (or marks it failed after MAX_ATTEMPTS). Errors are logged without secrets.
 */
export async function deliverDueEmails(options: { now?: Date; limit?: number; transport?: Transporter } = {}): Promise<DeliveryReport> {
  const now = options.now ?? new Date();
  const transport = options.transport ?? smtpTransport();
  const claimed = await db.transaction(async (tx) => {
    const rows = await tx
      .select()
      .from(emailOutbox)
      .where(and(eq(emailOutbox.status, "pending"), lte(emailOutbox.nextAttemptAt, now)))
      .orderBy(asc(emailOutbox.nextAttemptAt))
      .limit(options.limit ?? 20)
      .for("update", { skipLocked: true });
    if (rows.length > 0) {
      await tx
        .update(emailOutbox)
        .set({ nextAttemptAt: new Date(now.getTime() + CLAIM_LEASE_MS) })
        .where(inArray(emailOutbox.id, rows.map((r) => r.id)));
    }
    return rows;
  });
  const report: DeliveryReport = { claimed: claimed.length, sent: 0, retrying: 0, failed: 0 };
  const from = smtpSettings().from;
  for (const row of claimed) {
    const attempts = row.attempts + 1;
    try {
      await transport.sendMail({
        from,
        to: row.toAddress,
        subject: row.subject,
        text: row.textBody,
        html: row.htmlBody,
        attachments: row.attachments?.map((a) => ({ filename: a.filename, contentType: a.contentType, content: Buffer.from(a.content, "base64") })),
      });
      await db.update(emailOutbox).set({ status: "sent", attempts, sentAt: new Date(), lastError: null }).where(eq(emailOutbox.id, row.id));
      report.sent += 1;
    } catch (error) {
      const failed = attempts >= MAX_ATTEMPTS;
      const lastError = describeSmtpError(error);
      console.error(`[email] ${row.kind} ${row.id} attempt ${attempts} failed${failed ? " (giving up)" : ""}: ${lastError}`);
      await db
        .update(emailOutbox)
        .set({ attempts, lastError, status: failed ? "failed" : "pending", nextAttemptAt: new Date(Date.now() + retryDelayMs(attempts)) })
        .where(eq(emailOutbox.id, row.id));
      report[failed ? "failed" : "retrying"] += 1;
    }
  }
  return report;
}
