import "server-only";
import { and, desc, eq, inArray, isNotNull } from "drizzle-orm";
import { db } from "@/db/client";
import { pressTagOuts, users } from "@/db/schema";
import { NotFoundError } from "@/lib/auth/permissions";
import type { Actor } from "./actor";
import { notifyHoldersOfTagOut } from "./bookings";
import { pressAccess } from "./press-access";
import { clearOpenTagOuts, insertTagOut, listOpenTagOuts, TAG_OUT_COLUMNS, type OpenTagOut } from "./tag-outs";

export type TagOutView = OpenTagOut & { taggedByName: string | null };
export type ClearedTagOutView = TagOutView & { clearedAt: Date; clearReason: string | null; clearedByName: string | null };

/** Open tag-outs of a press, oldest first, with who tagged. Authorization: members of its shop. */
export async function listPressTagOuts(actor: Actor, pressId: string): Promise<TagOutView[]> {
  await pressAccess(db, actor, pressId, "viewPress");
  const open = (await listOpenTagOuts(db, [pressId])).get(pressId) ?? [];
  const names = await userNames(open.map((t) => t.id));
  return open.map((t) => ({ ...t, taggedByName: names.get(t.id) ?? null }));
}

async function userNames(tagOutIds: string[]): Promise<Map<string, string>> {
  if (tagOutIds.length === 0) return new Map();
  const rows = await db
    .select({ id: pressTagOuts.id, name: users.displayName })
    .from(pressTagOuts)
    .innerJoin(users, eq(users.id, pressTagOuts.taggedBy))
    .where(inArray(pressTagOuts.id, tagOutIds));
  return new Map(rows.map((r) => [r.id, r.name]));
}

/** The last few cleared tag-outs of a press (bounded). Authorization: members of its shop. */
export async function listClearedTagOuts(actor: Actor, pressId: string, limit = 5): Promise<ClearedTagOutView[]> {
  await pressAccess(db, actor, pressId, "viewPress");
  const rows = await db
    .select({
      ...TAG_OUT_COLUMNS,
      clearedAt: pressTagOuts.clearedAt,
      clearReason: pressTagOuts.clearReason,
      clearedByName: users.displayName,
    })
    .from(pressTagOuts)
    .leftJoin(users, eq(users.id, pressTagOuts.clearedBy))
    .where(and(eq(pressTagOuts.pressId, pressId), isNotNull(pressTagOuts.clearedAt)))
    .orderBy(desc(pressTagOuts.clearedAt))
    .limit(limit);
  return rows.map((r) => ({ ...r, clearedAt: r.clearedAt ?? new Date(0), taggedByName: null }));
}

/** Tags a press out by hand with a reason. Authorization: managers and inspectors of its shop. */
export async function tagOutPressByHand(actor: Actor, pressId: string, reason: string): Promise<{ id: string }> {
  return db.transaction(async (tx) => {
    await pressAccess(tx, actor, pressId, "tagOutPress", { forUpdate: true });
    const id = await insertTagOut(tx, { pressId, source: "manual", reason, taggedBy: actor.userId });
    await notifyHoldersOfTagOut(tx, pressId, reason);
    return { id };
  });
}

/**
 * Clears one open tag-out with a recorded reason. Authorization: managers and inspectors of the
 * press's shop; another shop's (or an already cleared) tag-out is NotFoundError.
 */
export async function clearTagOut(actor: Actor, tagOutId: string, reason: string): Promise<{ pressId: string }> {
  return db.transaction(async (tx) => {
    const [row] = await tx.select({ pressId: pressTagOuts.pressId, clearedAt: pressTagOuts.clearedAt }).from(pressTagOuts).where(eq(pressTagOuts.id, tagOutId)).limit(1);
    if (!row || row.clearedAt) throw new NotFoundError("No open tag-out with that id");
    await pressAccess(tx, actor, row.pressId, "clearTagOut", { forUpdate: true });
    const cleared = await clearOpenTagOuts(tx, { pressId: row.pressId, tagOutId, clearedBy: actor.userId, clearReason: reason });
    if (cleared === 0) throw new NotFoundError("No open tag-out with that id");
    return { pressId: row.pressId };
  });
}
