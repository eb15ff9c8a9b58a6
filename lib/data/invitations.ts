import "server-only";
import { and, desc, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { invitations, memberships, shops, users } from "@/db/schema";
import { linkSecretMatches, newLinkToken, parseLinkToken } from "@/lib/auth/link-token";
import { assertCan, NotFoundError, type Role } from "@/lib/auth/permissions";
import { normaliseEmail } from "@/lib/auth/sign-in";
import { appUrl } from "@/lib/app-url";
import { invitationEmail } from "@/lib/email/messages/invitation";
import { enqueueEmail } from "@/lib/email/outbox";
import { ConflictError } from "@/lib/errors";
import { newId } from "@/lib/ids";
import type { Actor } from "./actor";
import type { Executor } from "./press-access";
import { roleIn } from "./shops";
import { createUserWithPersonalShop } from "./users";

export const INVITATION_DAYS = 7;
const DAY_MS = 86_400_000;
/** Pending invitations shown per shop; older ones still work but the list stays bounded. */
const LIST_LIMIT = 100;

export type PendingInvitation = { id: string; email: string; role: Role; createdAt: Date; expiresAt: Date; expired: boolean };

async function managerOf(actor: Actor, shopId: string): Promise<void> {
  const role = await roleIn(actor, shopId);
  if (!role) throw new NotFoundError("Shop not found");
  assertCan(role, "manageMembers");
}

/** Issues a fresh secret for an invitation row and queues its e-mail, in the caller's transaction. */
async function sendInvitation(tx: Executor, actor: Actor, invitation: { id: string; shopId: string; email: string; role: Role }, origin: string | null, now: Date): Promise<void> {
  const { secret, secretHash } = newLinkToken();
  const expiresAt = new Date(now.getTime() + INVITATION_DAYS * DAY_MS);
  await tx.update(invitations).set({ secretHash, expiresAt }).where(eq(invitations.id, invitation.id));
  const [info] = await tx
    .select({ shopName: shops.name, inviterName: users.displayName })
    .from(shops)
    .innerJoin(users, eq(users.id, actor.userId))
    .where(eq(shops.id, invitation.shopId))
    .limit(1);
  const message = invitationEmail({
    shopName: info?.shopName ?? "a shop",
    inviterName: info?.inviterName ?? "A manager",
    role: invitation.role,
    link: appUrl(`/invite/${invitation.id}.${secret}`, origin),
    expiresInDays: INVITATION_DAYS,
  });
  await enqueueEmail(tx, { kind: "invitation", to: invitation.email, shopId: invitation.shopId, ...message });
}

/**
 * Invites an address to a shop with a role and queues the e-mail in the same transaction. A
 * pending invitation to the same address is replaced. Authorization: managers of the shop.
 */
export async function createInvitation(actor: Actor, shopId: string, input: { email: string; role: Role }, origin: string | null, now = new Date()): Promise<{ id: string }> {
  await managerOf(actor, shopId);
  const email = normaliseEmail(input.email);
  return db.transaction(async (tx) => {
    const [member] = await tx
      .select({ userId: users.id })
      .from(users)
      .innerJoin(memberships, and(eq(memberships.userId, users.id), eq(memberships.shopId, shopId)))
      .where(eq(users.email, email))
      .limit(1);
    if (member) throw new ConflictError("That person is already a member of this shop.");
    await tx
      .update(invitations)
      .set({ revokedAt: now })
      .where(and(eq(invitations.shopId, shopId), eq(invitations.email, email), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)));
    const id = newId();
    await tx.insert(invitations).values({ id, shopId, email, role: input.role, secretHash: Buffer.alloc(32), invitedBy: actor.userId, createdAt: now, expiresAt: now });
    await sendInvitation(tx, actor, { id, shopId, email, role: input.role }, origin, now);
    return { id };
  });
}

/** Pending (not accepted, not revoked) invitations, newest first. Authorization: managers of the shop. */
export async function listPendingInvitations(actor: Actor, shopId: string, now = new Date()): Promise<PendingInvitation[]> {
  await managerOf(actor, shopId);
  const rows = await db
    .select({ id: invitations.id, email: invitations.email, role: invitations.role, createdAt: invitations.createdAt, expiresAt: invitations.expiresAt })
    .from(invitations)
    .where(and(eq(invitations.shopId, shopId), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)))
    .orderBy(desc(invitations.createdAt))
    .limit(LIST_LIMIT);
  return rows.map((r) => ({ ...r, expired: r.expiresAt <= now }));
}

async function pendingInvitation(tx: Executor, actor: Actor, invitationId: string) {
  const [row] = await tx.select().from(invitations).where(eq(invitations.id, invitationId)).limit(1).for("update");
  if (!row) throw new NotFoundError("Invitation not found");
  await managerOf(actor, row.shopId);
  if (row.acceptedAt || row.revokedAt) throw new ConflictError("This invitation was already accepted or revoked.");
  return row;
}

/** Sends a pending invitation again with a new link (the old link stops working). Authorization: managers. */
export async function resendInvitation(actor: Actor, invitationId: string, origin: string | null, now = new Date()): Promise<void> {
  await db.transaction(async (tx) => {
    const row = await pendingInvitation(tx, actor, invitationId);
    await sendInvitation(tx, actor, row, origin, now);
  });
}

/** Withdraws a pending invitation. Authorization: managers. */
export async function revokeInvitation(actor: Actor, invitationId: string, now = new Date()): Promise<void> {
  await db.transaction(async (tx) => {
    await pendingInvitation(tx, actor, invitationId);
    await tx.update(invitations).set({ revokedAt: now }).where(eq(invitations.id, invitationId));
  });
}

export type InvitationView =
  | { ok: true; id: string; shopId: string; shopName: string; email: string; role: Role; accountExists: boolean }
  | { ok: false; reason: "invalid" | "used" | "expired" };

async function readInvitation(tx: Executor, token: string, now: Date, lock: boolean): Promise<InvitationView> {
  const parsed = parseLinkToken(token);
  if (!parsed) return { ok: false, reason: "invalid" };
  const query = tx.select({ inv: invitations, shopName: shops.name }).from(invitations).innerJoin(shops, eq(shops.id, invitations.shopId)).where(eq(invitations.id, parsed.id)).limit(1);
  const [row] = lock ? await query.for("update") : await query;
  if (!row || !linkSecretMatches(parsed.secret, row.inv.secretHash)) return { ok: false, reason: "invalid" };
  if (row.inv.acceptedAt || row.inv.revokedAt) return { ok: false, reason: "used" };
  if (row.inv.expiresAt <= now) return { ok: false, reason: "expired" };
  const accountExists = (await tx.$count(users, eq(users.email, row.inv.email))) > 0;
  return { ok: true, id: row.inv.id, shopId: row.inv.shopId, shopName: row.shopName, email: row.inv.email, role: row.inv.role, accountExists };
}

/** What an invitation link offers (public page). Authorization: holding the link. */
export async function getInvitation(token: string, now = new Date()): Promise<InvitationView> {
  return readInvitation(db, token, now, false);
}

/**
 * The signed-in actor joins the shop through the link: single use, only for the invited address.
 * Authorization: a valid link and a signed-in account with the invited e-mail.
 */
export async function acceptInvitation(actor: Actor, token: string, now = new Date()): Promise<InvitationView> {
  return db.transaction(async (tx) => {
    const view = await readInvitation(tx, token, now, true);
    if (!view.ok) return view;
    const [me] = await tx.select({ email: users.email }).from(users).where(eq(users.id, actor.userId)).limit(1);
    if (!me || me.email !== view.email) throw new ConflictError(`This invitation is for ${view.email}. Sign in with that address to accept it.`);
    await tx.insert(memberships).values({ shopId: view.shopId, userId: actor.userId, role: view.role }).onDuplicateKeyUpdate({ set: { role: view.role } });
    await tx.update(invitations).set({ acceptedAt: now, acceptedBy: actor.userId }).where(eq(invitations.id, view.id));
    await tx.update(users).set({ activeShopId: view.shopId }).where(eq(users.id, actor.userId));
    return view;
  });
}

/**
 * Makes an account for the invited address and joins the shop. The account is created first (with
 * its personal shop, in its own transaction); joining then uses the link once.
 * Authorization: a valid link for an address that has no account yet.
 */
export async function signUpWithInvitation(token: string, input: { displayName: string; password: string }, now = new Date()): Promise<{ userId: string } | InvitationView> {
  const view = await getInvitation(token, now);
  if (!view.ok) return view;
  if (view.accountExists) throw new ConflictError("An account with this e-mail already exists. Sign in, then open the link again.");
  const { userId } = await createUserWithPersonalShop({ email: view.email, displayName: input.displayName, password: input.password });
  const joined = await acceptInvitation({ userId }, token, now);
  return joined.ok ? { userId } : joined;
}
