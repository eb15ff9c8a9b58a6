import "server-only";
import { desc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { hourMeterReadings, presses } from "@/db/schema";
import { assertCan, NotFoundError } from "@/lib/auth/permissions";
import { ConflictError } from "@/lib/errors";
import { newId } from "@/lib/ids";
import type { PressInput, PressPatch } from "@/lib/validation/press";
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

export type HourReading = { id: number; hours: number; readAt: Date; note: string | null };

/**
 * Records an hour-meter reading. It may never be lower than the last one: the press row is locked
 * so two readings at once cannot both pass the check. Authorization: any member of the shop.
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
    if (input.hours < access.hourMeter) {
      throw new ConflictError(`The hour meter cannot go backwards: the last reading is ${access.hourMeter} h.`);
    }
    await tx.insert(hourMeterReadings).values({ pressId, hours: input.hours, readAt: now, recordedBy: actor.userId, note: input.note ?? null });
    await tx.update(presses).set({ hourMeter: input.hours, updatedAt: now }).where(eq(presses.id, pressId));
  });
}

/** Hour-meter readings, newest first. Authorization: members of the press's shop. */
export async function listHourReadings(actor: Actor, pressId: string): Promise<HourReading[]> {
  await pressAccess(db, actor, pressId, "viewPress");
  return db
    .select({ id: hourMeterReadings.id, hours: hourMeterReadings.hours, readAt: hourMeterReadings.readAt, note: hourMeterReadings.note })
    .from(hourMeterReadings)
    .where(eq(hourMeterReadings.pressId, pressId))
    .orderBy(desc(hourMeterReadings.readAt), desc(hourMeterReadings.id));
}
