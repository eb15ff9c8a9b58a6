import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { memberships, presses } from "@/db/schema";
import { pressStatus, type Lifecycle, type PressStatus } from "@/lib/status";
import type { Actor } from "./actor";
import { listInspectionDueByPress } from "./inspection-due";
import { pressAccess, type Executor } from "./press-access";
import { listPresses, type PressSummary } from "./presses";
import { listServiceDueByPress } from "./service-due";
import { listOpenTagOuts } from "./tag-outs";

/**
 * Status of many presses in a constant number of queries (tag-outs, inspections due, service due —
 * one each, never one per press). No authorization: callers pass presses they have already
 * authorized (or reached through the public status token).
 */
export async function loadStatuses(
  executor: Executor,
  list: readonly { id: string; lifecycle: Lifecycle }[],
  now = new Date(),
): Promise<Map<string, PressStatus>> {
  const ids = list.map((p) => p.id);
  const [tagOuts, inspections, service] = await Promise.all([
    listOpenTagOuts(executor, ids),
    listInspectionDueByPress(executor, ids, now),
    listServiceDueByPress(executor, ids, now),
  ]);
  return new Map(
    list.map((p) => [
      p.id,
      pressStatus({ lifecycle: p.lifecycle, tagOuts: tagOuts.get(p.id) ?? [], inspectionsDue: inspections.get(p.id) ?? [], serviceDue: service.get(p.id) ?? [] }),
    ]),
  );
}

/** Status of one press. Authorization: members of its shop (else NotFoundError). */
export async function getPressStatus(actor: Actor, pressId: string, now = new Date()): Promise<PressStatus> {
  const access = await pressAccess(db, actor, pressId, "viewPress");
  return (await loadStatuses(db, [{ id: pressId, lifecycle: access.lifecycle }], now)).get(pressId)!;
}

/** Status of every press of a shop, by press id. Authorization: members of that shop; others get an empty map. */
export async function listShopStatuses(actor: Actor, shopId: string, now = new Date()): Promise<Map<string, PressStatus>> {
  const rows = await db
    .select({ id: presses.id, lifecycle: presses.lifecycle })
    .from(presses)
    .innerJoin(memberships, and(eq(memberships.shopId, presses.shopId), eq(memberships.userId, actor.userId)))
    .where(eq(presses.shopId, shopId))
    .orderBy(asc(presses.name));
  return loadStatuses(db, rows, now);
}

export type PressWithStatus = PressSummary & { status: PressStatus };

/** The shop's presses, each with its status. Authorization: members of that shop; others get an empty list. */
export async function listPressesWithStatus(actor: Actor, shopId: string, now = new Date()): Promise<PressWithStatus[]> {
  const list = await listPresses(actor, shopId);
  const statuses = await loadStatuses(db, list, now);
  return list.map((p) => ({ ...p, status: statuses.get(p.id)! }));
}
