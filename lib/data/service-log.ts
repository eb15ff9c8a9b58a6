import "server-only";
import { and, desc, eq, lt, or, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { components, serviceEntries, serviceEntryRevisions, serviceTasks, shops, users, type ServiceKind, type ServicePart } from "@/db/schema";
import { NotFoundError } from "@/lib/auth/permissions";
import { newId } from "@/lib/ids";
import { localDate } from "@/lib/schedule";
import { fieldError, kindFieldProblems, type ServiceEntryInput, type ServiceEntryPatch } from "@/lib/validation/service";
import type { Actor } from "./actor";
import { replaceComponent } from "./components";
import { recordHourMeter } from "./press-edits";
import { assertNotRetired, pressAccess, type Executor } from "./press-access";

export type ServiceEntry = {
  id: string;
  pressId: string;
  kind: ServiceKind;
  performedOn: string;
  hours: number | null;
  parts: ServicePart[];
  componentId: string | null;
  componentLabel: string | null;
  installedComponentId: string | null;
  costCents: number | null;
  iso4406: string | null;
  reliefFoundBar: number | null;
  reliefSetBar: number | null;
  notes: string | null;
  performedByName: string | null;
  createdAt: Date;
  corrected: boolean;
};

const entryColumns = {
  id: serviceEntries.id,
  pressId: serviceEntries.pressId,
  kind: serviceEntries.kind,
  performedOn: serviceEntries.performedOn,
  hours: serviceEntries.hours,
  parts: serviceEntries.parts,
  componentId: serviceEntries.componentId,
  componentLabel: components.label,
  installedComponentId: serviceEntries.installedComponentId,
  costCents: serviceEntries.costCents,
  iso4406: serviceEntries.iso4406,
  reliefFoundBar: serviceEntries.reliefFoundBar,
  reliefSetBar: serviceEntries.reliefSetBar,
  notes: serviceEntries.notes,
  performedByName: users.displayName,
  createdAt: serviceEntries.createdAt,
  updatedAt: serviceEntries.updatedAt,
};

function entrySelect(executor: Executor) {
  return executor
    .select(entryColumns)
    .from(serviceEntries)
    .leftJoin(components, eq(components.id, serviceEntries.componentId))
    .leftJoin(users, eq(users.id, serviceEntries.performedBy));
}

function toEntry({ updatedAt, ...row }: Omit<ServiceEntry, "corrected"> & { updatedAt: Date }): ServiceEntry {
  return { ...row, corrected: updatedAt.getTime() > row.createdAt.getTime() };
}

export type ServiceLogPage = { entries: ServiceEntry[]; nextCursor: string | null };

/** Keyset cursor: the last row's date and id, newest first. */
export function encodeCursor(entry: { performedOn: string; id: string }): string {
  return `${entry.performedOn}.${entry.id}`;
}

function decodeCursor(cursor: string): { performedOn: string; id: string } {
  const m = /^(\d{4}-\d{2}-\d{2})\.([a-z2-7]{24})$/.exec(cursor);
  if (!m) throw fieldError([{ path: "cursor", message: "Not a cursor from this list." }]);
  return { performedOn: m[1]!, id: m[2]! };
}

/**
 * One page of a press's service log, newest first, optionally of one kind. Keyset-paginated, so
 * the cost of a page does not grow with the history. Authorization: members of the press's shop.
 */
export async function listServiceEntries(
  actor: Actor,
  pressId: string,
  options: { limit: number; cursor?: string; kind?: ServiceKind },
): Promise<ServiceLogPage> {
  await pressAccess(db, actor, pressId, "viewPress");
  const after = options.cursor ? decodeCursor(options.cursor) : null;
  const rows = await entrySelect(db)
    .where(
      and(
        eq(serviceEntries.pressId, pressId),
        options.kind ? eq(serviceEntries.kind, options.kind) : undefined,
        after
          ? or(lt(serviceEntries.performedOn, after.performedOn), and(eq(serviceEntries.performedOn, after.performedOn), lt(serviceEntries.id, after.id)))
          : undefined,
      ),
    )
    .orderBy(desc(serviceEntries.performedOn), desc(serviceEntries.id))
    .limit(options.limit + 1);
  const entries = rows.slice(0, options.limit).map(toEntry);
  const last = entries.at(-1);
  return { entries, nextCursor: rows.length > options.limit && last ? encodeCursor(last) : null };
}

/** One entry. Authorization: members of its press's shop (others: not-found). */
export async function getServiceEntry(actor: Actor, entryId: string): Promise<ServiceEntry> {
  const [row] = await entrySelect(db).where(eq(serviceEntries.id, entryId)).limit(1);
  if (!row) throw new NotFoundError("Service entry not found");
  await pressAccess(db, actor, row.pressId, "viewPress");
  return toEntry(row);
}

async function shopToday(executor: Executor, shopId: string, now: Date): Promise<string> {
  const [shop] = await executor.select({ timeZone: shops.timeZone }).from(shops).where(eq(shops.id, shopId)).limit(1);
  return localDate(now, shop?.timeZone ?? "UTC");
}

function refuseFutureDate(performedOn: string, today: string): void {
  if (performedOn > today) throw fieldError([{ path: "performedOn", message: `The date cannot be after today (${today} in the shop's time zone).` }]);
}

/**
 * Logs service on a press, in one transaction: the entry; its hour-meter reading through the
 * press records' own rule (never backwards); for a hose replacement, the component replacement
 * (like for like); and every plan task of the same kind restarted from this entry.
 * Authorization: managers and inspectors of the press's shop; not on a retired press.
 */
export async function createServiceEntry(actor: Actor, pressId: string, input: ServiceEntryInput, now = new Date()): Promise<{ id: string }> {
  return db.transaction(async (tx) => {
    const access = await pressAccess(tx, actor, pressId, "logService", { forUpdate: true });
    assertNotRetired(access);
    refuseFutureDate(input.performedOn, await shopToday(tx, access.shopId, now));
    const id = newId();
    if (input.hours != null) {
      await recordHourMeter(actor, pressId, { hours: input.hours, note: `Service log: ${input.kind}` }, now, tx);
    }
    let installedComponentId: string | null = null;
    if (input.componentId) {
      const [part] = await tx.select().from(components).where(and(eq(components.id, input.componentId), eq(components.pressId, pressId))).limit(1);
      if (!part) throw fieldError([{ path: "componentId", message: "That part is not on this press." }]);
      if (input.kind === "hose-replaced") {
        if (part.kind !== "hose") throw fieldError([{ path: "componentId", message: "Choose one of the press's hoses." }]);
        const replacement = { kind: part.kind, label: input.replacementLabel ?? part.label, spec: part.spec, maker: part.maker, partNumber: part.partNumber, supplier: part.supplier, costCents: null, purchased: true, installedOn: input.performedOn };
        ({ id: installedComponentId } = await replaceComponent(actor, part.id, { reason: "Replaced (service log)", removedOn: input.performedOn, replacement }, { executor: tx, action: "logService" }));
      }
    }
    const hoursAt = input.hours ?? access.hourMeter;
    await tx.insert(serviceEntries).values({
      id,
      pressId,
      kind: input.kind,
      performedOn: input.performedOn,
      hours: input.hours ?? null,
      parts: input.parts,
      componentId: input.componentId ?? null,
      installedComponentId,
      costCents: input.costCents ?? null,
      iso4406: input.iso4406 ?? null,
      reliefFoundBar: input.reliefFoundBar ?? null,
      reliefSetBar: input.reliefSetBar ?? null,
      notes: input.notes ?? null,
      performedBy: actor.userId,
      createdAt: now,
      updatedAt: now,
    });
    await restartTasks(tx, pressId, input.kind, { id, performedOn: input.performedOn, hours: hoursAt });
    return { id };
  });
}

/** A completing entry restarts every task of its kind whose interval started on or before its date. */
async function restartTasks(tx: Executor, pressId: string, kind: ServiceKind, entry: { id: string; performedOn: string; hours: number }): Promise<void> {
  await tx
    .update(serviceTasks)
    .set({ lastDoneOn: entry.performedOn, lastDoneHours: entry.hours, lastEntryId: entry.id })
    .where(and(eq(serviceTasks.pressId, pressId), eq(serviceTasks.kind, kind), sql`${serviceTasks.lastDoneOn} <= ${entry.performedOn}`));
}

const AUDITED = ["performedOn", "parts", "costCents", "iso4406", "reliefFoundBar", "reliefSetBar", "notes"] as const;

/**
 * Corrects an entry and keeps a revision of what changed, by whom and when (one transaction). The
 * kind, hour-meter reading and replaced part are history and cannot change. Authorization:
 * managers and inspectors of the press's shop.
 */
export async function updateServiceEntry(actor: Actor, entryId: string, patch: ServiceEntryPatch, now = new Date()): Promise<void> {
  await db.transaction(async (tx) => {
    const [row] = await tx.select().from(serviceEntries).where(eq(serviceEntries.id, entryId)).limit(1).for("update");
    if (!row) throw new NotFoundError("Service entry not found");
    const access = await pressAccess(tx, actor, row.pressId, "logService");
    assertNotRetired(access);
    const next = { ...row, ...Object.fromEntries(Object.entries(patch).filter(([, v]) => v !== undefined)) } as typeof row;
    const problems = kindFieldProblems(next);
    if (problems.length) throw fieldError(problems);
    if (patch.performedOn) refuseFutureDate(patch.performedOn, await shopToday(tx, access.shopId, now));
    const changes: Record<string, { from: unknown; to: unknown }> = {};
    for (const key of AUDITED) {
      if (patch[key] !== undefined && JSON.stringify(patch[key]) !== JSON.stringify(row[key])) changes[key] = { from: row[key], to: patch[key] };
    }
    if (Object.keys(changes).length === 0) return;
    await tx.update(serviceEntries).set({ ...patch, updatedAt: now }).where(eq(serviceEntries.id, entryId));
    await tx.insert(serviceEntryRevisions).values({ entryId, changedBy: actor.userId, changedAt: now, changes });
    // A task restarted by this entry follows a corrected date.
    if (changes.performedOn) {
      await tx.update(serviceTasks).set({ lastDoneOn: next.performedOn }).where(eq(serviceTasks.lastEntryId, entryId));
    }
  });
}

export type ServiceRevision = { id: number; changedAt: Date; changedByName: string | null; changes: Record<string, { from: unknown; to: unknown }> };

/** The corrections of an entry, newest first (bounded). Authorization: members of the press's shop. */
export async function listServiceRevisions(actor: Actor, entryId: string): Promise<ServiceRevision[]> {
  await getServiceEntry(actor, entryId);
  return db
    .select({ id: serviceEntryRevisions.id, changedAt: serviceEntryRevisions.changedAt, changedByName: users.displayName, changes: serviceEntryRevisions.changes })
    .from(serviceEntryRevisions)
    .leftJoin(users, eq(users.id, serviceEntryRevisions.changedBy))
    .where(eq(serviceEntryRevisions.entryId, entryId))
    .orderBy(desc(serviceEntryRevisions.changedAt), desc(serviceEntryRevisions.id))
    .limit(100);
}
