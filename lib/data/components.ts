import "server-only";
import { and, asc, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { components } from "@/db/schema";
import { NotFoundError, type Action } from "@/lib/auth/permissions";
import { ConflictError } from "@/lib/errors";
import { newId } from "@/lib/ids";
import { SPEC_SCHEMAS, type ComponentSpec } from "@/lib/validation/component-spec";
import type { ComponentInput, ComponentPatch } from "@/lib/validation/press";
import type { Actor } from "./actor";
import { assertNotRetired, pressAccess, type Executor } from "./press-access";

export type ComponentRow = typeof components.$inferSelect;

/** Components of a press, installed first; removed ones only when asked. Authorization: members of its shop. */
export async function listComponents(actor: Actor, pressId: string, options: { includeRemoved?: boolean } = {}): Promise<ComponentRow[]> {
  await pressAccess(db, actor, pressId, "viewPress");
  return db
    .select()
    .from(components)
    .where(and(eq(components.pressId, pressId), options.includeRemoved ? undefined : isNull(components.removedOn)))
    .orderBy(asc(components.kind), asc(components.label), asc(components.createdAt));
}

/** Adds a part to a press. Authorization: managers of its shop; not on a retired press. */
export async function createComponent(actor: Actor, pressId: string, input: ComponentInput): Promise<{ id: string }> {
  return db.transaction(async (tx) => {
    const access = await pressAccess(tx, actor, pressId, "editPress", { forUpdate: true });
    assertNotRetired(access);
    const id = newId();
    await tx.insert(components).values({ id, pressId, ...input, purchased: input.purchased ?? access.lifecycle !== "planned" });
    return { id };
  });
}

/** The component and the actor's access to its press (checked for `action`), row-locked when asked. */
async function componentAccess(executor: Executor, actor: Actor, componentId: string, forUpdate: boolean, action: Action = "editPress") {
  const query = executor.select().from(components).where(eq(components.id, componentId)).limit(1);
  const [row] = forUpdate ? await query.for("update") : await query;
  if (!row) throw new NotFoundError("Component not found");
  // Not a member of the press's shop reads as not-found too.
  const access = await pressAccess(executor, actor, row.pressId, action, { forUpdate });
  return { row, access };
}

/** One component. Authorization: members of its press's shop. */
export async function getComponent(actor: Actor, componentId: string): Promise<ComponentRow> {
  const [row] = await db.select().from(components).where(eq(components.id, componentId)).limit(1);
  if (!row) throw new NotFoundError("Component not found");
  await pressAccess(db, actor, row.pressId, "viewPress");
  return row;
}

/**
 * Edits a component's details or spec (the spec is re-validated against its kind). Authorization:
 * managers. A removed part is history and cannot be edited.
 */
export async function updateComponent(actor: Actor, componentId: string, patch: ComponentPatch): Promise<void> {
  await db.transaction(async (tx) => {
    const { row, access } = await componentAccess(tx, actor, componentId, true);
    assertNotRetired(access);
    if (row.removedOn) throw new ConflictError("This part was removed; its record is history and cannot be edited.");
    const { spec: rawSpec, ...rest } = patch;
    let spec: ComponentSpec | undefined;
    if (rawSpec) spec = SPEC_SCHEMAS[row.kind].parse({ ...row.spec, ...rawSpec, kind: row.kind }) as ComponentSpec;
    await tx.update(components).set({ ...rest, ...(spec ? { spec } : {}), updatedAt: new Date() }).where(eq(components.id, componentId));
  });
}

/**
 * Deletes a part entered by mistake. Authorization: managers. A part with history (replaced, or
 * replacing another) is kept: replace or remove it instead.
 */
export async function deleteComponent(actor: Actor, componentId: string): Promise<void> {
  await db.transaction(async (tx) => {
    const { row, access } = await componentAccess(tx, actor, componentId, true);
    assertNotRetired(access);
    const [predecessor] = await tx.select({ id: components.id }).from(components).where(eq(components.replacedById, componentId)).limit(1);
    if (row.removedOn || row.replacedById || predecessor) {
      throw new ConflictError("This part is part of the press's history and cannot be deleted.");
    }
    await tx.delete(components).where(eq(components.id, componentId));
  });
}

/**
 * Replaces a part: the new one is installed and the old one is kept with its removal date, the
 * reason and a link to its successor — all in one transaction, so nothing is half-replaced.
 * Authorization: managers — or, for a hose replacement logged in the service log, whoever may log
 * service (`action: "logService"`, inside the log entry's transaction). Same kind only.
 */
export async function replaceComponent(
  actor: Actor,
  componentId: string,
  input: { reason: string; removedOn: string; replacement: ComponentInput },
  options: { executor?: Executor; action?: "editPress" | "logService" } = {},
): Promise<{ id: string }> {
  return (options.executor ?? db).transaction(async (tx) => {
    const { row, access } = await componentAccess(tx, actor, componentId, true, options.action);
    assertNotRetired(access);
    if (row.removedOn) throw new ConflictError("This part was already removed.");
    if (input.replacement.kind !== row.kind) throw new ConflictError("A part can only be replaced by one of the same kind.");
    if (row.installedOn && input.removedOn < row.installedOn) throw new ConflictError("The removal date is before the part was installed.");
    const id = newId();
    await tx.insert(components).values({
      id,
      pressId: row.pressId,
      ...input.replacement,
      installedOn: input.replacement.installedOn ?? input.removedOn,
      purchased: input.replacement.purchased ?? true,
    });
    await tx
      .update(components)
      .set({ removedOn: input.removedOn, removalReason: input.reason, replacedById: id, updatedAt: new Date() })
      .where(eq(components.id, componentId));
    return { id };
  });
}

/** Removes a part without a successor (e.g. a die taken out of use). Authorization: managers. */
export async function removeComponent(actor: Actor, componentId: string, input: { reason: string; removedOn: string }): Promise<void> {
  await db.transaction(async (tx) => {
    const { row, access } = await componentAccess(tx, actor, componentId, true);
    assertNotRetired(access);
    if (row.removedOn) throw new ConflictError("This part was already removed.");
    await tx.update(components).set({ removedOn: input.removedOn, removalReason: input.reason, updatedAt: new Date() }).where(eq(components.id, componentId));
  });
}

