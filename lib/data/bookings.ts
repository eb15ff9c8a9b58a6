import "server-only";
import { and, asc, eq, gt, lt, or, type SQL } from "drizzle-orm";
import { db } from "@/db/client";
import { bookings } from "@/db/schema/bookings";
import { memberships, presses, shops, users } from "@/db/schema";
import { assertCan, NotFoundError } from "@/lib/auth/permissions";
import { checkSlot, slotWarnings, type Slot } from "@/lib/booking-rules";
import { appUrl } from "@/lib/app-url";
import { bookingCancelled, bookingConfirmation, bookingIcs, tagOutNotice } from "@/lib/email/shop-messages";
import { enqueueEmail } from "@/lib/email/outbox";
import { ConflictError, LockedError } from "@/lib/errors";
import { newId } from "@/lib/ids";
import { unusableReason } from "@/lib/status";
import type { Actor } from "./actor";
import { recordAudit } from "./audit";
import { listInspectionDueByPress } from "./inspection-due";
import { pressAccess } from "./press-access";
import { loadStatuses } from "./press-status";
import { withRetry } from "./retry";
import { listServiceDueByPress } from "./service-due";
import { isDuplicateKey } from "./users";

export type BookingView = { id: string; pressId: string; pressName: string; startsAt: Date; endsAt: Date; holderName: string; mine: boolean; canCancel: boolean };

/** Longest window one calendar read may cover, so a response stays small whatever the history. */
export const MAX_WINDOW_DAYS = 14;
export const MY_BOOKINGS_PAGE = 20;

/** Due items of one press from the service and inspections seams, turned into warnings for the slot. */
async function dueWarnings(executor: Parameters<typeof loadStatuses>[0], pressId: string, slot: Slot, now: Date): Promise<string[]> {
  const [inspections, service] = await Promise.all([listInspectionDueByPress(executor, [pressId], now), listServiceDueByPress(executor, [pressId], now)]);
  return slotWarnings(inspections.get(pressId) ?? [], service.get(pressId) ?? [], slot);
}

/**
 * Books a press. Authorization: members of its shop with `bookPress`. The press row is locked, so
 * the tag-out check and the insert see the same state (a tag-out inserted meanwhile waits on it).
 * Overlap is MariaDB's rule (UNIQUE … WITHOUT OVERLAPS): the loser gets ConflictError (409).
 * Tagged out or not in service: LockedError (423) with the reason. Deadlocks are retried.
 */
export async function createBooking(actor: Actor, pressId: string, slot: Slot, now = new Date()): Promise<{ id: string; warnings: string[] }> {
  return withRetry(() =>
    db.transaction(async (tx) => {
      const access = await pressAccess(tx, actor, pressId, "bookPress", { forUpdate: true });
      const [ctx] = await tx
        .select({ shopName: shops.name, timeZone: shops.timeZone, openingHours: shops.openingHours, pressName: presses.name, email: users.email, holderName: users.displayName })
        .from(presses)
        .innerJoin(shops, eq(shops.id, presses.shopId))
        .innerJoin(users, eq(users.id, actor.userId))
        .where(eq(presses.id, pressId));
      if (!ctx) throw new NotFoundError("Press not found");
      checkSlot(slot, now, ctx.timeZone, ctx.openingHours);
      const status = (await loadStatuses(tx, [{ id: pressId, lifecycle: access.lifecycle }], now)).get(pressId)!;
      const refusal = unusableReason(status);
      if (refusal) throw new LockedError(`This press cannot be booked. ${refusal}`);
      const id = newId();
      try {
        await tx.insert(bookings).values({ id, pressId, userId: actor.userId, startsAt: slot.startsAt, endsAt: slot.endsAt });
      } catch (error) {
        if (isDuplicateKey(error, "bookings_no_overlap")) throw new ConflictError("That time overlaps another booking of this press.");
        throw error;
      }
      const warnings = await dueWarnings(tx, pressId, slot, now);
      const ics = bookingIcs({ id, ...slot, pressName: ctx.pressName, shopName: ctx.shopName, appUrl: appUrl(`/bookings?press=${pressId}`) });
      const message = bookingConfirmation({ shopName: ctx.shopName, pressName: ctx.pressName, holderName: ctx.holderName, slot, timeZone: ctx.timeZone, warnings, ics });
      await enqueueEmail(tx, { kind: "booking-confirmation", to: ctx.email, shopId: access.shopId, ...message });
      return { id, warnings };
    }),
  );
}

const viewColumns = {
  id: bookings.id,
  pressId: bookings.pressId,
  pressName: presses.name,
  startsAt: bookings.startsAt,
  endsAt: bookings.endsAt,
  userId: bookings.userId,
  holderName: users.displayName,
  role: memberships.role,
};

/** Bookings on presses of the actor's shops (the membership join is the authorization), with the holder's name. */
function visibleBookings(actor: Actor, where: SQL | undefined) {
  return db
    .select(viewColumns)
    .from(bookings)
    .innerJoin(presses, eq(presses.id, bookings.pressId))
    .innerJoin(users, eq(users.id, bookings.userId))
    .innerJoin(memberships, and(eq(memberships.shopId, presses.shopId), eq(memberships.userId, actor.userId)))
    .where(where);
}

function toView(actor: Actor, row: { id: string; pressId: string; pressName: string; startsAt: Date; endsAt: Date; userId: string; holderName: string; role: Parameters<typeof assertCan>[0] }, now: Date): BookingView {
  const mine = row.userId === actor.userId;
  const canCancel = row.endsAt > now && (mine || row.role === "manager");
  return { id: row.id, pressId: row.pressId, pressName: row.pressName, startsAt: row.startsAt, endsAt: row.endsAt, holderName: row.holderName, mine, canCancel };
}

/**
 * Bookings of a press overlapping [from, to) (at most MAX_WINDOW_DAYS). Authorization: members of
 * the press's shop, who see who booked (names only).
 */
export async function listPressBookings(actor: Actor, pressId: string, from: Date, to: Date, now = new Date()): Promise<BookingView[]> {
  await pressAccess(db, actor, pressId, "viewPress");
  const end = new Date(Math.min(to.getTime(), from.getTime() + MAX_WINDOW_DAYS * 86_400_000));
  const rows = await visibleBookings(actor, and(eq(bookings.pressId, pressId), lt(bookings.startsAt, end), gt(bookings.endsAt, from)))
    .orderBy(asc(bookings.startsAt))
    .limit(500);
  return rows.map((r) => toView(actor, r, now));
}

export type Cursor = { startsAt: Date; id: string };
export const encodeCursor = (c: Cursor): string => `${c.startsAt.getTime()}.${c.id}`;
export function decodeCursor(raw: string | null | undefined): Cursor | null {
  const m = raw ? /^(\d{1,15})\.([a-z2-7]{24})$/.exec(raw) : null;
  return m ? { startsAt: new Date(Number(m[1])), id: m[2]! } : null;
}

/**
 * The actor's own bookings that have not ended yet, soonest first, one page at a time (keyset on
 * start time and id). Authorization: own bookings in shops the actor still belongs to.
 */
export async function listMyBookings(actor: Actor, after: Cursor | null, now = new Date()): Promise<{ bookings: BookingView[]; next: string | null }> {
  const keyset = after ? or(gt(bookings.startsAt, after.startsAt), and(eq(bookings.startsAt, after.startsAt), gt(bookings.id, after.id))) : undefined;
  const rows = await visibleBookings(actor, and(eq(bookings.userId, actor.userId), gt(bookings.endsAt, now), keyset))
    .orderBy(asc(bookings.startsAt), asc(bookings.id))
    .limit(MY_BOOKINGS_PAGE + 1);
  const page = rows.slice(0, MY_BOOKINGS_PAGE).map((r) => toView(actor, r, now));
  const last = page.at(-1);
  return { bookings: page, next: rows.length > MY_BOOKINGS_PAGE && last ? encodeCursor(last) : null };
}

async function findBooking(actor: Actor, bookingId: string) {
  const [row] = await db
    .select({ ...viewColumns, email: users.email, shopId: presses.shopId, shopName: shops.name, timeZone: shops.timeZone })
    .from(bookings)
    .innerJoin(presses, eq(presses.id, bookings.pressId))
    .innerJoin(shops, eq(shops.id, presses.shopId))
    .innerJoin(users, eq(users.id, bookings.userId))
    .innerJoin(memberships, and(eq(memberships.shopId, presses.shopId), eq(memberships.userId, actor.userId)))
    .where(eq(bookings.id, bookingId))
    .limit(1);
  if (!row) throw new NotFoundError("Booking not found");
  return row;
}

/** One booking with its calendar file. Authorization: the holder, or a member who may cancel any booking (managers). */
export async function getBookingIcs(actor: Actor, bookingId: string): Promise<string> {
  const row = await findBooking(actor, bookingId);
  if (row.userId !== actor.userId) assertCan(row.role, "cancelAnyBooking");
  return bookingIcs({ id: row.id, startsAt: row.startsAt, endsAt: row.endsAt, pressName: row.pressName, shopName: row.shopName, appUrl: appUrl(`/bookings?press=${row.pressId}`) });
}

/**
 * Cancels (deletes) a booking that has not ended, freeing its slot. Authorization: members cancel
 * their own (`bookPress`), managers any (`cancelAnyBooking`); a holder cancelled by someone else is e-mailed.
 */
export async function cancelBooking(actor: Actor, bookingId: string, now = new Date()): Promise<void> {
  const row = await findBooking(actor, bookingId);
  const mine = row.userId === actor.userId;
  assertCan(row.role, mine ? "bookPress" : "cancelAnyBooking");
  if (row.endsAt <= now) throw new ConflictError("That booking is over and stays on the record.");
  await withRetry(() =>
    db.transaction(async (tx) => {
      const [result] = await tx.delete(bookings).where(eq(bookings.id, bookingId));
      if (result.affectedRows === 0) throw new NotFoundError("Booking not found");
      if (!mine) {
        const [by] = await tx.select({ name: users.displayName }).from(users).where(eq(users.id, actor.userId));
        const message = bookingCancelled({ shopName: row.shopName, pressName: row.pressName, holderName: row.holderName, slot: row, timeZone: row.timeZone, byName: by?.name ?? "A manager" });
        await enqueueEmail(tx, { kind: "booking-cancelled", to: row.email, shopId: row.shopId, ...message });
      }
    }),
  );
  await recordAudit({
    action: "booking-cancelled",
    userId: actor.userId,
    shopId: row.shopId,
    detail: { bookingId, pressId: row.pressId, holder: row.userId, startsAt: row.startsAt.toISOString(), endsAt: row.endsAt.toISOString() },
  });
}

/**
 * E-mails everyone holding a booking of the press that has not ended: it was just tagged out.
 * Runs in the caller's transaction (the one that tagged it out), after the caller authorized the
 * tag-out. One message per holder listing their slots; bounded to the next 500 bookings.
 */
export async function notifyHoldersOfTagOut(executor: Parameters<typeof loadStatuses>[0], pressId: string, reason: string, now = new Date()): Promise<number> {
  const rows = await executor
    .select({ userId: bookings.userId, email: users.email, name: users.displayName, startsAt: bookings.startsAt, endsAt: bookings.endsAt, pressName: presses.name, shopId: shops.id, shopName: shops.name, timeZone: shops.timeZone })
    .from(bookings)
    .innerJoin(users, eq(users.id, bookings.userId))
    .innerJoin(presses, eq(presses.id, bookings.pressId))
    .innerJoin(shops, eq(shops.id, presses.shopId))
    .where(and(eq(bookings.pressId, pressId), gt(bookings.endsAt, now)))
    .orderBy(asc(bookings.startsAt))
    .limit(500);
  const byHolder = new Map<string, typeof rows>();
  for (const row of rows) byHolder.set(row.userId, [...(byHolder.get(row.userId) ?? []), row]);
  for (const slots of byHolder.values()) {
    const first = slots[0]!;
    const message = tagOutNotice({ shopName: first.shopName, pressName: first.pressName, holderName: first.name, reason, slots, timeZone: first.timeZone });
    await enqueueEmail(executor, { kind: "tag-out-alert", to: first.email, shopId: first.shopId, ...message });
  }
  return byHolder.size;
}

/** The time zone a press is booked in (its shop's). Authorization: members of the press's shop. */
export async function getPressTimeZone(actor: Actor, pressId: string): Promise<string> {
  const access = await pressAccess(db, actor, pressId, "viewPress");
  const [row] = await db.select({ timeZone: shops.timeZone }).from(shops).where(eq(shops.id, access.shopId));
  return row?.timeZone ?? "UTC";
}
