import "server-only";
import { and, asc, eq, gt } from "drizzle-orm";
import { db } from "@/db/client";
import { memberships, presses, shops, users } from "@/db/schema";
import { appUrl } from "@/lib/app-url";
import { reminderDigestEmail } from "@/lib/email/messages/reminder-digest";
import { enqueueEmail } from "@/lib/email/outbox";
import { localDate } from "@/lib/schedule";
import { formatInTimeZone } from "@/lib/service/format";
import { listServiceDueByPress } from "./service-due";

/** Shops read per batch; the job walks all shops by id without holding them in memory. */
const SHOP_BATCH = 200;

export type ReminderReport = { shops: number; queued: number; alreadySent: number };

/**
 * Queues one digest per manager per shop with anything due soon or overdue, at most once a day
 * per shop (the outbox's dedupe key holds the shop's local date). Authorization: the job secret,
 * checked by the route handler; reads every shop.
 */
export async function queueReminderDigests(now = new Date()): Promise<ReminderReport> {
  const report: ReminderReport = { shops: 0, queued: 0, alreadySent: 0 };
  let after = "";
  for (;;) {
    const batch = await db.select({ id: shops.id, name: shops.name, timeZone: shops.timeZone }).from(shops).where(gt(shops.id, after)).orderBy(asc(shops.id)).limit(SHOP_BATCH);
    if (batch.length === 0) break;
    after = batch.at(-1)!.id;
    for (const shop of batch) {
      const shopPresses = await db.select({ id: presses.id, name: presses.name }).from(presses).where(and(eq(presses.shopId, shop.id), eq(presses.lifecycle, "in-service"))).orderBy(asc(presses.name));
      const due = await listServiceDueByPress(db, shopPresses.map((p) => p.id), now);
      if (due.size === 0) continue;
      report.shops += 1;
      const lines = shopPresses.flatMap((p) =>
        (due.get(p.id) ?? []).map((item) => ({
          pressName: p.name,
          title: item.title,
          state: item.state,
          due: [item.dueDate ? formatInTimeZone(item.dueDate, shop.timeZone) : null, item.dueHours !== null ? `${item.dueHours} h` : null].filter(Boolean).join(" or "),
        })),
      );
      lines.sort((a, b) => Number(b.state === "overdue") - Number(a.state === "overdue"));
      const message = reminderDigestEmail({ shopName: shop.name, lines, link: appUrl("/dashboard") });
      const managers = await db
        .select({ userId: users.id, email: users.email })
        .from(memberships)
        .innerJoin(users, eq(users.id, memberships.userId))
        .where(and(eq(memberships.shopId, shop.id), eq(memberships.role, "manager")));
      const day = localDate(now, shop.timeZone);
      for (const manager of managers) {
        const id = await enqueueEmail(db, { kind: "reminder-digest", to: manager.email, shopId: shop.id, dedupeKey: `reminder:${shop.id}:${manager.userId}:${day}`, ...message });
        report[id ? "queued" : "alreadySent"] += 1;
      }
    }
  }
  return report;
}
