import { sql } from "drizzle-orm";
import { index, int, mediumtext, mysqlEnum, mysqlTable, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { ID_LENGTH, jsonColumn, utc } from "./columns";
import { shops } from "./shops";

/** Every kind of message the app sends; the sender and the dev outbox group by it. */
export const EMAIL_KINDS = [
  "invitation",
  "password-reset",
  "sign-up-attempt",
  "reminder-digest",
  "booking-confirmation",
  "booking-cancelled",
  "tag-out-alert",
  "problem-report",
] as const;

export const OUTBOX_STATUSES = ["pending", "sent", "failed"] as const;

/** An attachment as queued: `content` is base64 (binary-safe; the sender decodes it). */
export type StoredAttachment = { filename: string; contentType: string; content: string };

/**
 * The e-mail outbox: an action that causes a message commits its row in the same transaction as
 * the change itself; a sender delivers pending rows over SMTP and retries with back-off, so
 * nothing is lost while SMTP is down or the app restarts. `dedupeKey` makes a message idempotent
 * (e.g. one reminder digest per shop per day).
 */
export const emailOutbox = mysqlTable(
  "email_outbox",
  {
    id: varchar("id", { length: ID_LENGTH }).primaryKey(),
    kind: mysqlEnum("kind", EMAIL_KINDS).notNull(),
    shopId: varchar("shop_id", { length: ID_LENGTH }).references(() => shops.id, { onDelete: "set null" }),
    toAddress: varchar("to_address", { length: 320 }).notNull(),
    subject: varchar("subject", { length: 300 }).notNull(),
    textBody: mediumtext("text_body").notNull(),
    htmlBody: mediumtext("html_body").notNull(),
    attachments: jsonColumn<StoredAttachment[]>("attachments"),
    status: mysqlEnum("status", OUTBOX_STATUSES).notNull().default("pending"),
    attempts: int("attempts").notNull().default(0),
    nextAttemptAt: utc("next_attempt_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    lastError: varchar("last_error", { length: 500 }),
    dedupeKey: varchar("dedupe_key", { length: 191 }),
    createdAt: utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    sentAt: utc("sent_at"),
  },
  (t) => [index("email_outbox_due_idx").on(t.status, t.nextAttemptAt), uniqueIndex("email_outbox_dedupe_key").on(t.dedupeKey)],
);
