import "server-only";
import { eq, sql } from "drizzle-orm";
import { emailOutbox, type EMAIL_KINDS, type StoredAttachment } from "@/db/schema";
import { newId } from "@/lib/ids";
import type { Executor } from "@/lib/data/press-access";

export type EmailKind = (typeof EMAIL_KINDS)[number];

/** One message as its cause writes it; the sender turns it into SMTP. */
export type OutgoingEmail = {
  kind: EmailKind;
  to: string;
  subject: string;
  text: string;
  html: string;
  shopId?: string | null;
  attachments?: StoredAttachment[];
  /** Makes the message idempotent: a second enqueue with the same key is ignored. */
  dedupeKey?: string;
};

// CR/LF in a header value would let input write headers of its own.
const HEADER_BREAK = /[\r\n\u0000-\u001f\u007f]/;

/**
 * Queues a message in the caller's transaction, so it is committed exactly when the change that
 * causes it is. Returns the outbox id, or null when `dedupeKey` was already queued.
 */
export async function enqueueEmail(executor: Executor, email: OutgoingEmail): Promise<string | null> {
  if (HEADER_BREAK.test(email.to) || !email.to.includes("@")) throw new Error("enqueueEmail: invalid recipient");
  const subject = email.subject.replace(/[\r\n\u0000-\u001f\u007f]+/g, " ").slice(0, 300);
  const id = newId();
  await executor
    .insert(emailOutbox)
    .values({
      id,
      kind: email.kind,
      shopId: email.shopId ?? null,
      toAddress: email.to,
      subject,
      textBody: email.text,
      htmlBody: email.html,
      attachments: email.attachments ?? null,
      dedupeKey: email.dedupeKey ?? null,
    })
    .onDuplicateKeyUpdate({ set: { id: sql`id` } });
  if (!email.dedupeKey) return id;
  // The driver counts a duplicate as a found row, so ask which row holds the key.
  const [row] = await executor.select({ id: emailOutbox.id }).from(emailOutbox).where(eq(emailOutbox.dedupeKey, email.dedupeKey));
  return row?.id === id ? id : null;
}
