import "server-only";
import { and, asc, eq, gt, isNull, lt } from "drizzle-orm";
import { db } from "@/db/client";
import { presses, shops } from "@/db/schema";
import { bookings } from "@/db/schema/bookings";
import { NotFoundError } from "@/lib/auth/permissions";
import { freeStretches } from "@/lib/booking-rules";
import { newId } from "@/lib/ids";
import type { PressStatus } from "@/lib/status";
import { localDate, startOfLocalDay } from "@/lib/time-zone";
import type { Actor } from "./actor";
import { pressAccess } from "./press-access";
import { loadStatuses } from "./press-status";

export const STATUS_TOKEN_PATTERN = /^[a-z2-7]{24}$/;

/**
 * The token of a press's public status page, made on first use. Authorization: members of the
 * press's shop (everyone there may print the card to hang on the press).
 */
export async function getStatusToken(actor: Actor, pressId: string): Promise<string> {
  await pressAccess(db, actor, pressId, "viewPress");
  // Only fills an empty token, so two first views at once agree on one.
  await db.update(presses).set({ statusToken: newId() }).where(and(eq(presses.id, pressId), isNull(presses.statusToken)));
  const [row] = await db.select({ token: presses.statusToken }).from(presses).where(eq(presses.id, pressId));
  return row!.token!;
}

/** Replaces the token, so the old link and printed cards stop working. Authorization: managers. */
export async function regenerateStatusToken(actor: Actor, pressId: string): Promise<string> {
  await pressAccess(db, actor, pressId, "regenerateStatusLink");
  const token = newId();
  await db.update(presses).set({ statusToken: token }).where(eq(presses.id, pressId));
  return token;
}

type FreeDay = { date: string; label: "Today" | "Tomorrow"; free: { startsAt: string; endsAt: string }[] };

/** What anyone holding the link may see: no names, no ids, no bookings' holders — only status and free time. */
export type PublicStatus = { pressName: string; timeZone: string; status: PressStatus; days: FreeDay[]; checkedAt: string };

/** The public status page's data. Authorization: the token itself (unknown token: NotFoundError). */
export async function getPublicStatus(token: string, now = new Date()): Promise<PublicStatus & { pressId: string }> {
  if (!STATUS_TOKEN_PATTERN.test(token)) throw new NotFoundError("Status page not found");
  const [press] = await db
    .select({ id: presses.id, name: presses.name, lifecycle: presses.lifecycle, timeZone: shops.timeZone, openingHours: shops.openingHours })
    .from(presses)
    .innerJoin(shops, eq(shops.id, presses.shopId))
    .where(eq(presses.statusToken, token))
    .limit(1);
  if (!press) throw new NotFoundError("Status page not found");
  const today = startOfLocalDay(now, press.timeZone);
  const tomorrow = startOfLocalDay(now, press.timeZone, 1);
  const after = startOfLocalDay(now, press.timeZone, 2);
  const [statuses, booked] = await Promise.all([
    loadStatuses(db, [{ id: press.id, lifecycle: press.lifecycle }], now),
    db
      .select({ startsAt: bookings.startsAt, endsAt: bookings.endsAt })
      .from(bookings)
      .where(and(eq(bookings.pressId, press.id), lt(bookings.startsAt, after), gt(bookings.endsAt, today)))
      .orderBy(asc(bookings.startsAt))
      .limit(200),
  ]);
  const status = statuses.get(press.id)!;
  const day = (start: Date, end: Date, label: FreeDay["label"]): FreeDay => ({
    date: localDate(start, press.timeZone),
    label,
    free: status.usable
      ? freeStretches(start, end.getTime() - start.getTime(), booked, now, press.timeZone, press.openingHours).map((s) => ({ startsAt: s.startsAt.toISOString(), endsAt: s.endsAt.toISOString() }))
      : [],
  });
  return {
    pressId: press.id,
    pressName: press.name,
    timeZone: press.timeZone,
    status,
    days: [day(today, tomorrow, "Today"), day(tomorrow, after, "Tomorrow")],
    checkedAt: now.toISOString(),
  };
}
