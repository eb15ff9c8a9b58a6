import "server-only";
import { and, asc, eq, gt, inArray, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { memberships, presses, shops, users, type OpeningHours } from "@/db/schema";
import { bookings } from "@/db/schema/bookings";
import { assertCan, NotFoundError, type Role } from "@/lib/auth/permissions";
import type { Actor } from "./actor";

export type ShopSummary = { id: string; name: string; personal: boolean; timeZone: string; currency: string; role: Role };

/** The shops the actor belongs to, with the actor's role in each. Authorization: own memberships only. */
export async function listMyShops(actor: Actor): Promise<ShopSummary[]> {
  return db
    .select({ id: shops.id, name: shops.name, personal: shops.personal, timeZone: shops.timeZone, currency: shops.currency, role: memberships.role })
    .from(memberships)
    .innerJoin(shops, eq(shops.id, memberships.shopId))
    .where(eq(memberships.userId, actor.userId))
    .orderBy(sql`${shops.personal} DESC`, asc(shops.name));
}

/**
 * The actor's shops and the one they are working in: the one they last switched to if they are
 * still a member, otherwise their first shop (null only for a user with no memberships at all).
 * One query for both, since every signed-in page needs both.
 */
export async function getMyShops(actor: Actor, preferredShopId: string | null): Promise<{ shop: ShopSummary | null; shops: ShopSummary[] }> {
  const shops = await listMyShops(actor);
  return { shop: shops.find((s) => s.id === preferredShopId) ?? shops[0] ?? null, shops };
}

/** The shop the actor is working in (see getMyShops). */
export async function getActiveShop(actor: Actor, preferredShopId: string | null): Promise<ShopSummary | null> {
  return (await getMyShops(actor, preferredShopId)).shop;
}

/** Switches the actor's working shop. Authorization: the actor must be a member (else not-found). */
export async function switchActiveShop(actor: Actor, shopId: string): Promise<void> {
  const role = await roleIn(actor, shopId);
  if (!role) throw new NotFoundError("Shop not found");
  await db.update(users).set({ activeShopId: shopId }).where(eq(users.id, actor.userId));
}

/** The actor's role in a shop, or null when not a member. */
export async function roleIn(actor: Actor, shopId: string): Promise<Role | null> {
  const [row] = await db
    .select({ role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.userId, actor.userId), eq(memberships.shopId, shopId)))
    .limit(1);
  return row?.role ?? null;
}

export type MemberRow = { userId: string; displayName: string; email: string; role: Role; since: Date };

/** Members of a shop. Authorization: any member of that shop; others get not-found. */
export async function listMembers(actor: Actor, shopId: string): Promise<MemberRow[]> {
  const role = await roleIn(actor, shopId);
  if (!role) throw new NotFoundError("Shop not found");
  assertCan(role, "viewShop");
  return db
    .select({
      userId: users.id,
      displayName: users.displayName,
      email: users.email,
      role: memberships.role,
      since: memberships.createdAt,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.shopId, shopId))
    .orderBy(asc(users.displayName));
}

/** Renames a shop or changes its time zone. Authorization: managers of that shop. */
export async function updateShop(actor: Actor, shopId: string, input: { name: string; timeZone: string }): Promise<void> {
  const role = await roleIn(actor, shopId);
  if (!role) throw new NotFoundError("Shop not found");
  assertCan(role, "editShop");
  await db.update(shops).set({ name: input.name.trim(), timeZone: input.timeZone }).where(eq(shops.id, shopId));
}

export class LastManagerError extends Error {
  constructor() {
    super("A shop needs at least one manager.");
    this.name = "LastManagerError";
  }
}

/**
 * Changes a member's role. Authorization: managers of that shop. The last manager cannot be
 * demoted, so a shop is never left without anyone able to manage it.
 */
export async function changeMemberRole(actor: Actor, shopId: string, userId: string, newRole: Role): Promise<void> {
  const role = await roleIn(actor, shopId);
  if (!role) throw new NotFoundError("Shop not found");
  assertCan(role, "manageMembers");
  await db.transaction(async (tx) => {
    const rows = await tx
      .select({ userId: memberships.userId, role: memberships.role })
      .from(memberships)
      .where(eq(memberships.shopId, shopId))
      .for("update");
    const target = rows.find((r) => r.userId === userId);
    if (!target) throw new NotFoundError("Member not found");
    const managers = rows.filter((r) => r.role === "manager").length;
    if (target.role === "manager" && newRole !== "manager" && managers <= 1) throw new LastManagerError();
    await tx
      .update(memberships)
      .set({ role: newRole })
      .where(and(eq(memberships.shopId, shopId), eq(memberships.userId, userId)));
  });
}

/** Sets or clears (null) the hours bookings must fall in. Authorization: managers of that shop. */
export async function updateOpeningHours(actor: Actor, shopId: string, hours: OpeningHours | null): Promise<void> {
  const role = await roleIn(actor, shopId);
  if (!role) throw new NotFoundError("Shop not found");
  assertCan(role, "editShop");
  await db.update(shops).set({ openingHours: hours }).where(eq(shops.id, shopId));
}

/** The shop's opening hours (null: any time). Authorization: members of that shop. */
export async function getOpeningHours(actor: Actor, shopId: string): Promise<OpeningHours | null> {
  const role = await roleIn(actor, shopId);
  if (!role) throw new NotFoundError("Shop not found");
  const [row] = await db.select({ hours: shops.openingHours }).from(shops).where(eq(shops.id, shopId));
  return row?.hours ?? null;
}

/**
 * Removes a member from a shop, with their bookings there that have not ended. Authorization:
 * managers of that shop. The last manager cannot be removed (nor remove themselves).
 */
export async function removeMember(actor: Actor, shopId: string, userId: string, now = new Date()): Promise<void> {
  const role = await roleIn(actor, shopId);
  if (!role) throw new NotFoundError("Shop not found");
  assertCan(role, "manageMembers");
  await db.transaction(async (tx) => {
    const rows = await tx.select({ userId: memberships.userId, role: memberships.role }).from(memberships).where(eq(memberships.shopId, shopId)).for("update");
    const target = rows.find((r) => r.userId === userId);
    if (!target) throw new NotFoundError("Member not found");
    if (target.role === "manager" && rows.filter((r) => r.role === "manager").length <= 1) throw new LastManagerError();
    const shopPresses = tx.select({ id: presses.id }).from(presses).where(eq(presses.shopId, shopId));
    await tx.delete(bookings).where(and(eq(bookings.userId, userId), gt(bookings.endsAt, now), inArray(bookings.pressId, shopPresses)));
    await tx.delete(memberships).where(and(eq(memberships.shopId, shopId), eq(memberships.userId, userId)));
  });
}
