import "server-only";
import { db } from "@/db/client";
import { auditLog } from "@/db/schema";

export type AuditEntry = {
  action: string;
  userId?: string | null;
  shopId?: string | null;
  ip?: string | null;
  detail?: Record<string, string | number | boolean | null>;
};

/** Appends to the audit log. Authorization: callers record their own actions; nothing reads it back in the app. */
export async function recordAudit(entry: AuditEntry, executor: Pick<typeof db, "insert"> = db): Promise<void> {
  await executor.insert(auditLog).values({
    action: entry.action,
    userId: entry.userId ?? null,
    shopId: entry.shopId ?? null,
    ip: entry.ip ?? null,
    detail: entry.detail ?? null,
  });
}
