import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import { db } from "@/db/client";
import { memberships, presses, serviceTasks, shops } from "@/db/schema";
import { compareDue, taskDue } from "@/lib/schedule";
import type { Actor } from "./actor";
import type { Executor } from "./press-access";

/** The seam the press status and the due lists read: only tasks due soon or overdue. */
export type ServiceDueItem = { taskId: string; title: string; state: "due-soon" | "overdue"; dueDate: Date | null; dueHours: number | null };

/**
 * Service due soon or overdue per press, most urgent first; presses with nothing due are absent.
 * Only presses in service are counted (a planned, building or retired press has nothing due).
 * Authorization: none here — callers pass press ids they have already authorized.
 */
export async function listServiceDueByPress(executor: Executor, pressIds: readonly string[], now: Date): Promise<Map<string, ServiceDueItem[]>> {
  const out = new Map<string, ServiceDueItem[]>();
  if (pressIds.length === 0) return out;
  const rows = await executor
    .select({ task: serviceTasks, hours: presses.hourMeter, timeZone: shops.timeZone })
    .from(serviceTasks)
    .innerJoin(presses, eq(presses.id, serviceTasks.pressId))
    .innerJoin(shops, eq(shops.id, presses.shopId))
    .where(and(inArray(serviceTasks.pressId, [...pressIds]), eq(presses.lifecycle, "in-service")));
  const graded = rows
    .map(({ task, hours, timeZone }) => ({ task, due: taskDue(task, { now, hours, timeZone }) }))
    .filter(({ due }) => due.state !== "ok")
    .sort(compareDue);
  for (const { task, due } of graded) {
    const list = out.get(task.pressId) ?? [];
    list.push({ taskId: task.id, title: task.title, state: due.state as ServiceDueItem["state"], dueDate: due.dueDate, dueHours: due.dueHours });
    out.set(task.pressId, list);
  }
  return out;
}

export type DueListItem = ServiceDueItem & { kind: "service"; pressId: string; pressName: string; shopId: string; shopName: string };

/** Cap on the presses one due list reads: a shop has a handful; this bounds a very large one. */
const MAX_PRESSES = 500;

/**
 * What is due across the actor's shops (or one of them), most urgent first.
 * Authorization: only presses of shops the actor is a member of.
 */
export async function listDueForActor(actor: Actor, options: { shopId?: string; now?: Date } = {}): Promise<DueListItem[]> {
  const now = options.now ?? new Date();
  const mine = await db
    .select({ id: presses.id, name: presses.name, shopId: shops.id, shopName: shops.name })
    .from(presses)
    .innerJoin(memberships, and(eq(memberships.shopId, presses.shopId), eq(memberships.userId, actor.userId)))
    .innerJoin(shops, eq(shops.id, presses.shopId))
    .where(and(eq(presses.lifecycle, "in-service"), options.shopId ? eq(presses.shopId, options.shopId) : undefined))
    .limit(MAX_PRESSES);
  const due = await listServiceDueByPress(db, mine.map((p) => p.id), now);
  const items: DueListItem[] = [];
  for (const press of mine) {
    for (const item of due.get(press.id) ?? []) items.push({ ...item, kind: "service", pressId: press.id, pressName: press.name, shopId: press.shopId, shopName: press.shopName });
  }
  return items.sort((a, b) => Number(b.state === "overdue") - Number(a.state === "overdue") || (a.dueDate?.getTime() ?? Infinity) - (b.dueDate?.getTime() ?? Infinity));
}
