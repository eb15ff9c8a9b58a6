import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { serviceTasks, shops, type ServiceKind } from "@/db/schema";
import { NotFoundError } from "@/lib/auth/permissions";
import { ConflictError } from "@/lib/errors";
import { newId } from "@/lib/ids";
import { compareDue, localDate, taskDue, type TaskDue } from "@/lib/schedule";
import { STARTING_PLAN } from "@/lib/service/starting-plan";
import type { ServiceTaskInput } from "@/lib/validation/service";
import type { Actor } from "./actor";
import { assertNotRetired, pressAccess, type Executor, type PressAccess } from "./press-access";

export type ServiceTaskView = {
  id: string;
  title: string;
  kind: ServiceKind;
  intervalDays: number | null;
  intervalHours: number | null;
  lastDoneOn: string;
  lastDoneHours: number;
  fromStartingPlan: boolean;
  due: TaskDue;
};

/** Hard cap per press: a plan is a handful of tasks, never a growing list. */
export const MAX_TASKS_PER_PRESS = 40;

async function shopZone(executor: Executor, shopId: string): Promise<string> {
  const [shop] = await executor.select({ timeZone: shops.timeZone }).from(shops).where(eq(shops.id, shopId)).limit(1);
  return shop?.timeZone ?? "UTC";
}

export type ServicePlanView = { tasks: ServiceTaskView[]; timeZone: string; today: string };

/**
 * A press's plan with where each task stands, most urgent first, and the shop's zone and local
 * date (forms default to it). Authorization: members of its shop.
 */
export async function getServicePlan(actor: Actor, pressId: string, now = new Date()): Promise<ServicePlanView> {
  const access = await pressAccess(db, actor, pressId, "viewPress");
  const [rows, timeZone] = await Promise.all([
    db.select().from(serviceTasks).where(eq(serviceTasks.pressId, pressId)).orderBy(asc(serviceTasks.createdAt)).limit(MAX_TASKS_PER_PRESS),
    shopZone(db, access.shopId),
  ]);
  const tasks = rows
    .map((task) => ({ task, due: taskDue(task, { now, hours: access.hourMeter, timeZone }) }))
    .sort(compareDue)
    .map(({ task, due }) => ({
      id: task.id,
      title: task.title,
      kind: task.kind,
      intervalDays: task.intervalDays,
      intervalHours: task.intervalHours,
      lastDoneOn: task.lastDoneOn,
      lastDoneHours: task.lastDoneHours,
      fromStartingPlan: task.fromStartingPlan,
      due,
    }));
  return { tasks, timeZone, today: localDate(now, timeZone) };
}

async function insertTasks(tx: Executor, access: PressAccess, tasks: readonly (ServiceTaskInput & { fromStartingPlan?: boolean })[], now: Date): Promise<string[]> {
  const count = await tx.$count(serviceTasks, eq(serviceTasks.pressId, access.pressId));
  if (count + tasks.length > MAX_TASKS_PER_PRESS) throw new ConflictError(`A press's plan holds at most ${MAX_TASKS_PER_PRESS} tasks.`);
  // A new task counts from today and the current reading, until a log entry completes it.
  const today = localDate(now, await shopZone(tx, access.shopId));
  const ids: string[] = [];
  for (const task of tasks) {
    const id = newId();
    ids.push(id);
    await tx.insert(serviceTasks).values({
      id,
      pressId: access.pressId,
      title: task.title,
      kind: task.kind,
      intervalDays: task.intervalDays ?? null,
      intervalHours: task.intervalHours ?? null,
      lastDoneOn: today,
      lastDoneHours: access.hourMeter,
      fromStartingPlan: task.fromStartingPlan ?? false,
      createdAt: now,
    });
  }
  return ids;
}

/** Adds a task. Authorization: managers of the press's shop; not on a retired press. */
export async function createServiceTask(actor: Actor, pressId: string, input: ServiceTaskInput, now = new Date()): Promise<{ id: string }> {
  return db.transaction(async (tx) => {
    const access = await pressAccess(tx, actor, pressId, "editServicePlan", { forUpdate: true });
    assertNotRetired(access);
    const [id] = await insertTasks(tx, access, [input], now);
    return { id: id! };
  });
}

/**
 * Adds the common-practice starting plan to a press that has no plan yet (one transaction).
 * Authorization: managers. A press with tasks already answers 409.
 */
export async function applyStartingPlan(actor: Actor, pressId: string, now = new Date()): Promise<{ ids: string[] }> {
  return db.transaction(async (tx) => {
    const access = await pressAccess(tx, actor, pressId, "editServicePlan", { forUpdate: true });
    assertNotRetired(access);
    const existing = await tx.$count(serviceTasks, eq(serviceTasks.pressId, pressId));
    if (existing > 0) throw new ConflictError("This press already has a service plan; adjust its tasks instead.");
    return { ids: await insertTasks(tx, access, STARTING_PLAN.map((t) => ({ ...t, fromStartingPlan: true })), now) };
  });
}

async function taskAccess(tx: Executor, actor: Actor, taskId: string) {
  const [task] = await tx.select().from(serviceTasks).where(eq(serviceTasks.id, taskId)).limit(1).for("update");
  if (!task) throw new NotFoundError("Task not found");
  const access = await pressAccess(tx, actor, task.pressId, "editServicePlan");
  assertNotRetired(access);
  return task;
}

/** Changes a task's name, completing kind or intervals; its last completion stays. Authorization: managers. */
export async function updateServiceTask(actor: Actor, taskId: string, input: ServiceTaskInput): Promise<void> {
  await db.transaction(async (tx) => {
    await taskAccess(tx, actor, taskId);
    await tx
      .update(serviceTasks)
      .set({ title: input.title, kind: input.kind, intervalDays: input.intervalDays ?? null, intervalHours: input.intervalHours ?? null, fromStartingPlan: false })
      .where(eq(serviceTasks.id, taskId));
  });
}

/** Removes a task from the plan (the log keeps its entries). Authorization: managers. */
export async function deleteServiceTask(actor: Actor, taskId: string): Promise<{ pressId: string }> {
  return db.transaction(async (tx) => {
    const task = await taskAccess(tx, actor, taskId);
    await tx.delete(serviceTasks).where(and(eq(serviceTasks.id, taskId), eq(serviceTasks.pressId, task.pressId)));
    return { pressId: task.pressId };
  });
}
