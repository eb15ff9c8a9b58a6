import "server-only";
import { and, eq, inArray, isNotNull, max } from "drizzle-orm";
import { db } from "@/db/client";
import { inspections, inspectionTemplates, memberships, presses } from "@/db/schema";
import { dueState, hasCalendar } from "@/lib/inspections/due";
import type { Actor } from "./actor";
import type { Executor } from "./press-access";

export type InspectionDueItem = { templateId: string; name: string; state: "due-soon" | "overdue"; dueAt: Date | null };

/**
 * Calendar inspections (weekly, monthly, yearly) due soon or overdue on each in-service press,
 * from the last signed inspection of each of the shop's active checklists. Presses with nothing
 * due are absent from the map. No authorization: callers have already authorized the press ids.
 */
export async function listInspectionDueByPress(executor: Executor, pressIds: readonly string[], now: Date): Promise<Map<string, InspectionDueItem[]>> {
  const byPress = new Map<string, InspectionDueItem[]>();
  if (pressIds.length === 0) return byPress;
  const [pressRows, lastSigned] = await Promise.all([
    executor
      .select({ pressId: presses.id, templateId: inspectionTemplates.id, name: inspectionTemplates.name, cadence: inspectionTemplates.cadence })
      .from(presses)
      .innerJoin(inspectionTemplates, and(eq(inspectionTemplates.shopId, presses.shopId), eq(inspectionTemplates.archived, false)))
      .where(and(inArray(presses.id, [...pressIds]), eq(presses.lifecycle, "in-service"))),
    executor
      .select({ pressId: inspections.pressId, templateId: inspections.templateId, last: max(inspections.signedAt) })
      .from(inspections)
      .where(and(inArray(inspections.pressId, [...pressIds]), isNotNull(inspections.signedAt)))
      .groupBy(inspections.pressId, inspections.templateId),
  ]);
  const last = new Map(lastSigned.map((r) => [`${r.pressId}/${r.templateId}`, r.last]));
  for (const row of pressRows) {
    if (!hasCalendar(row.cadence)) continue;
    const due = dueState(row.cadence, last.get(`${row.pressId}/${row.templateId}`) ?? null, now);
    if (!due) continue;
    const list = byPress.get(row.pressId) ?? [];
    list.push({ templateId: row.templateId, name: row.name, ...due });
    byPress.set(row.pressId, list);
  }
  return byPress;
}

/** Due inspections of the given presses after checking each is in the actor's shops (others are skipped). */
export async function listDueForActor(actor: Actor, pressIds: readonly string[], now = new Date()): Promise<Map<string, InspectionDueItem[]>> {
  if (pressIds.length === 0) return new Map();
  const allowed = await db
    .select({ id: presses.id })
    .from(presses)
    .innerJoin(memberships, and(eq(memberships.shopId, presses.shopId), eq(memberships.userId, actor.userId)))
    .where(inArray(presses.id, [...pressIds]));
  return listInspectionDueByPress(db, allowed.map((p) => p.id), now);
}
