import "server-only";
import { and, desc, eq, isNotNull } from "drizzle-orm";
import { alias } from "drizzle-orm/mysql-core";
import { db } from "@/db/client";
import { components } from "@/db/schema";
import { pressTimeline, type TimelineEvent } from "@/lib/press/timeline";
import type { Actor } from "./actor";
import { listHourReadings } from "./press-edits";
import { pressAccess } from "./press-access";

/** How many events the press page's History card shows, whatever the press's age. */
export const HISTORY_SHOWN = 20;

/**
 * The newest `limit` events of a press's history (parts installed, removed or replaced, hour-meter
 * entries, its creation): each source is read newest first and at most `limit` rows, so the cost
 * stays flat however long the history. Authorization: members of the press's shop.
 */
export async function listRecentHistory(actor: Actor, pressId: string, createdAt: Date, limit = HISTORY_SHOWN): Promise<TimelineEvent[]> {
  await pressAccess(db, actor, pressId, "viewPress");
  const successor = alias(components, "successor");
  const columns = {
    id: components.id,
    label: components.label,
    installedOn: components.installedOn,
    removedOn: components.removedOn,
    removalReason: components.removalReason,
    replacedById: components.replacedById,
  };
  const [installed, removed, readings] = await Promise.all([
    db.select(columns).from(components).where(and(eq(components.pressId, pressId), isNotNull(components.installedOn))).orderBy(desc(components.installedOn), desc(components.id)).limit(limit),
    db
      .select({ ...columns, replacedByLabel: successor.label })
      .from(components)
      .leftJoin(successor, eq(successor.id, components.replacedById))
      .where(and(eq(components.pressId, pressId), isNotNull(components.removedOn)))
      .orderBy(desc(components.removedOn), desc(components.id))
      .limit(limit),
    listHourReadings(actor, pressId, limit),
  ]);
  // A part both installed and removed recently comes back from both queries: keep one copy with its removal.
  const parts = new Map([...installed, ...removed].map((p) => [p.id, p]));
  return pressTimeline(createdAt, [...parts.values()], readings, limit);
}
