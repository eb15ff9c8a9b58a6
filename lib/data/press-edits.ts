import "server-only";
import { and, desc, eq, gt, inArray, isNull, lte } from "drizzle-orm";
import { db } from "@/db/client";
import { hourMeterReadings, presses, users } from "@/db/schema";
import { assertCan, NotFoundError } from "@/lib/auth/permissions";
import { ConflictError } from "@/lib/errors";
import { newId } from "@/lib/ids";
import { hourReadingProblem, type LastReading } from "@/lib/press/hour-meter";
import type { PressInput, PressPatch } from "@/lib/validation/press";
import { recordAudit } from "./audit";
import type { Actor } from "./actor";
import { assertNotRetired, pressAccess, type Executor } from "./press-access";
import { roleIn } from "./shops";

/** Creates a press in a shop. Authorization: managers of that shop (others: not-found / forbidden). */
export async function createPress(actor: Actor, shopId: string, input: PressInput): Promise<{ id: string }> {
  const role = await roleIn(actor, shopId);
  if (!role) throw new NotFoundError("Shop not found");
  assertCan(role, "editPress");
  const id = newId();
  await db.insert(presses).values({ id, shopId, ...input });
  return { id };
}

/**
 * Edits a press's record. Authorization: managers of its shop. A retired press cannot be edited;
 * retiring is an edit like any other (lifecycle → retired) and is final.
 */
export async function updatePress(actor: Actor, pressId: string, patch: PressPatch): Promise<void> {
  await db.transaction(async (tx) => {
    const access = await pressAccess(tx, actor, pressId, "editPress", { forUpdate: true });
    assertNotRetired(access);
    if (Object.keys(patch).length === 0) return;
    await tx.update(presses).set({ ...patch, updatedAt: new Date() }).where(eq(presses.id, pressId));
  });
}

export type HourReading = {
  id: number;
  hours: number;
  readAt: Date;
  note: string | null;
  kind: "reading" | "correction";
  /** Set on a reading a manager's correction replaced. */
  voided: boolean;
  recordedByName: string | null;
};

/** The press's latest entry that counts (not voided by a correction), under the caller's lock. */
async function lastValidReading(tx: Executor, pressId: string): Promise<LastReading | null> {
  const [row] = await tx
    .select({ id: hourMeterReadings.id, hours: hourMeterReadings.hours, readAt: hourMeterReadings.readAt })
    .from(hourMeterReadings)
    .where(and(eq(hourMeterReadings.pressId, pressId), isNull(hourMeterReadings.voidedBy)))
    .orderBy(desc(hourMeterReadings.readAt), desc(hourMeterReadings.id))
    .limit(1);
  return row ?? null;
}

/**
 * Records an hour-meter reading. It may never be lower than the last one, nor higher than the time
 * since the last one allows (lib/press/hour-meter.ts): the press row is locked so two readings at
 * once cannot both pass the check. Authorization: any member of the shop.
 * Pass `executor` to record it inside a caller's transaction (e.g. with a service-log entry).
 */
export async function recordHourMeter(
  actor: Actor,
  pressId: string,
  input: { hours: number; note?: string | null },
  now = new Date(),
  executor: Executor = db,
): Promise<void> {
  await executor.transaction(async (tx) => {
    const access = await pressAccess(tx, actor, pressId, "recordHours", { forUpdate: true });
    assertNotRetired(access);
    const problem = hourReadingProblem(await lastValidReading(tx, pressId), input.hours, now, access.hourMeter);
    if (problem) throw new ConflictError(problem);
    await tx.insert(hourMeterReadings).values({ pressId, hours: input.hours, readAt: now, recordedBy: actor.userId, note: input.note ?? null });
    await tx.update(presses).set({ hourMeter: input.hours, updatedAt: now }).where(eq(presses.id, pressId));
  });
}

/**
 * A manager corrects a wrong reading: every reading above the corrected value is voided (kept, and
 * shown struck through, pointing at the correction) and a correction entry records the value, who
 * and why. The value must fit the entries that stay (no lower than the last of them, no higher than
 * the time since it allows), so the log stays monotonic and a correction cannot jam the meter
 * either. Authorization: managers of the press's shop.
 */
export async function correctHourMeter(actor: Actor, pressId: string, input: { hours: number; reason: string }, now = new Date()): Promise<void> {
  await db.transaction(async (tx) => {
    const access = await pressAccess(tx, actor, pressId, "correctHours", { forUpdate: true });
    assertNotRetired(access);
    if (input.hours >= access.hourMeter) {
      throw new ConflictError(`A correction lowers the meter below its last reading (${access.hourMeter} h); to move it forward, record a reading.`);
    }
    const wrong = await tx
      .select({ id: hourMeterReadings.id })
      .from(hourMeterReadings)
      .where(and(eq(hourMeterReadings.pressId, pressId), isNull(hourMeterReadings.voidedBy), gt(hourMeterReadings.hours, input.hours)));
    const [kept] = await tx
      .select({ hours: hourMeterReadings.hours, readAt: hourMeterReadings.readAt })
      .from(hourMeterReadings)
      .where(and(eq(hourMeterReadings.pressId, pressId), isNull(hourMeterReadings.voidedBy), lte(hourMeterReadings.hours, input.hours)))
      .orderBy(desc(hourMeterReadings.readAt), desc(hourMeterReadings.id))
      .limit(1);
    const problem = hourReadingProblem(kept ?? null, input.hours, now);
    if (problem) throw new ConflictError(problem);
    const [inserted] = await tx
      .insert(hourMeterReadings)
      .values({ pressId, hours: input.hours, readAt: now, recordedBy: actor.userId, note: input.reason, kind: "correction" });
    const ids = wrong.map((w) => w.id);
    if (ids.length > 0) await tx.update(hourMeterReadings).set({ voidedBy: inserted.insertId }).where(inArray(hourMeterReadings.id, ids));
    await tx.update(presses).set({ hourMeter: input.hours, updatedAt: now }).where(eq(presses.id, pressId));
    await recordAudit({ action: "hour-meter.corrected", userId: actor.userId, shopId: access.shopId, detail: { pressId, from: access.hourMeter, to: input.hours, voided: ids.length } }, tx);
  });
}

/** Entries shown with a press: the newest, bounded whatever the history. */
export const HOUR_READINGS_PAGE = 50;

/** Hour-meter entries, newest first, at most `limit`. Authorization: members of the press's shop. */
export async function listHourReadings(actor: Actor, pressId: string, limit = HOUR_READINGS_PAGE): Promise<HourReading[]> {
  await pressAccess(db, actor, pressId, "viewPress");
  const rows = await db
    .select({
      id: hourMeterReadings.id,
      hours: hourMeterReadings.hours,
      readAt: hourMeterReadings.readAt,
      note: hourMeterReadings.note,
      kind: hourMeterReadings.kind,
      voidedBy: hourMeterReadings.voidedBy,
      recordedByName: users.displayName,
    })
    .from(hourMeterReadings)
    .leftJoin(users, eq(users.id, hourMeterReadings.recordedBy))
    .where(eq(hourMeterReadings.pressId, pressId))
    .orderBy(desc(hourMeterReadings.readAt), desc(hourMeterReadings.id))
    .limit(Math.min(Math.max(1, limit), HOUR_READINGS_PAGE));
  return rows.map(({ voidedBy, ...r }) => ({ ...r, voided: voidedBy !== null }));
}
