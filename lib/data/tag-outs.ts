import "server-only";
import { and, asc, eq, inArray, isNull } from "drizzle-orm";
import { pressTagOuts, type TagOutSource } from "@/db/schema";
import { newId } from "@/lib/ids";
import type { Executor } from "./press-access";

/** The columns of a tag-out as the app shows it (shared by the open and cleared lists). */
export const TAG_OUT_COLUMNS = {
  id: pressTagOuts.id,
  pressId: pressTagOuts.pressId,
  source: pressTagOuts.source,
  sourceId: pressTagOuts.sourceId,
  reason: pressTagOuts.reason,
  taggedAt: pressTagOuts.taggedAt,
};

export type OpenTagOut = { id: string; pressId: string; source: TagOutSource; sourceId: string | null; reason: string; taggedAt: Date };

/*
 * Tag-out primitives. They do no authorization of their own: call them only from a data-layer
 * function that has already checked the actor's access to the press (pressAccess) for the action
 * that causes the tag-out (tagOutPress, signInspection, reportProblem, closeProblem, clearTagOut).
 */

/** Tags the press out, in the caller's transaction. */
export async function insertTagOut(
  executor: Executor,
  input: { pressId: string; source: TagOutSource; sourceId?: string | null; reason: string; taggedBy: string | null },
): Promise<string> {
  const id = newId();
  await executor.insert(pressTagOuts).values({
    id,
    pressId: input.pressId,
    source: input.source,
    sourceId: input.sourceId ?? null,
    reason: input.reason.slice(0, 500),
    taggedBy: input.taggedBy,
  });
  return id;
}

/**
 * Clears open tag-outs of a press — all of them, or only those of one source / source record.
 * Returns how many were cleared.
 */
export async function clearOpenTagOuts(
  executor: Executor,
  input: { pressId: string; clearedBy: string; clearReason: string; source?: TagOutSource; sourceId?: string; tagOutId?: string },
): Promise<number> {
  const conditions = [eq(pressTagOuts.pressId, input.pressId), isNull(pressTagOuts.clearedAt)];
  if (input.source) conditions.push(eq(pressTagOuts.source, input.source));
  if (input.sourceId) conditions.push(eq(pressTagOuts.sourceId, input.sourceId));
  if (input.tagOutId) conditions.push(eq(pressTagOuts.id, input.tagOutId));
  const [result] = await executor
    .update(pressTagOuts)
    .set({ clearedAt: new Date(), clearedBy: input.clearedBy, clearReason: input.clearReason.slice(0, 500) })
    .where(and(...conditions));
  return result.affectedRows;
}

/** Open tag-outs of the given presses (already authorized by the caller), oldest first. */
export async function listOpenTagOuts(executor: Executor, pressIds: readonly string[]): Promise<Map<string, OpenTagOut[]>> {
  const byPress = new Map<string, OpenTagOut[]>();
  if (pressIds.length === 0) return byPress;
  const rows = await executor
    .select(TAG_OUT_COLUMNS)
    .from(pressTagOuts)
    .where(and(inArray(pressTagOuts.pressId, [...pressIds]), isNull(pressTagOuts.clearedAt)))
    .orderBy(asc(pressTagOuts.taggedAt));
  for (const row of rows) {
    const list = byPress.get(row.pressId) ?? [];
    list.push(row);
    byPress.set(row.pressId, list);
  }
  return byPress;
}
