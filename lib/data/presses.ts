import "server-only";
import { and, asc, count, eq } from "drizzle-orm";
import { cache } from "react";
import { db } from "@/db/client";
import { components, memberships, presses, shops } from "@/db/schema";
import type { FRAME_TYPES } from "@/db/schema/presses";
import { assertCan, NotFoundError, type Role } from "@/lib/auth/permissions";
import { evaluateSizing, type SizingInput } from "@/lib/hydraulics";
import { newId } from "@/lib/ids";
import { componentsFromSizing } from "@/lib/press/from-sizing";
import type { Actor } from "./actor";
import { roleIn } from "./shops";

export type PressSummary = {
  id: string;
  shopId: string;
  name: string;
  frameType: (typeof presses.$inferSelect)["frameType"];
  lifecycle: (typeof presses.$inferSelect)["lifecycle"];
  ratedForceKn: number | null;
  daylightMm: number | null;
  strokeMm: number | null;
  reliefPressureBar: number | null;
  hourMeter: number;
  location: string | null;
};

const summaryColumns = {
  id: presses.id,
  shopId: presses.shopId,
  name: presses.name,
  frameType: presses.frameType,
  lifecycle: presses.lifecycle,
  ratedForceKn: presses.ratedForceKn,
  daylightMm: presses.daylightMm,
  strokeMm: presses.strokeMm,
  reliefPressureBar: presses.reliefPressureBar,
  hourMeter: presses.hourMeter,
  location: presses.location,
};

/** Presses of one shop. Authorization: members of that shop; anyone else sees an empty list. */
export async function listPresses(actor: Actor, shopId: string): Promise<PressSummary[]> {
  return db
    .select(summaryColumns)
    .from(presses)
    .innerJoin(memberships, and(eq(memberships.shopId, presses.shopId), eq(memberships.userId, actor.userId)))
    .where(eq(presses.shopId, shopId))
    .orderBy(asc(presses.name));
}

/**
 * How many presses one shop has, in one indexed query (the benchmark's floor page).
 * Authorization: members of that shop; anyone else gets 0, as listPresses gives them an empty list.
 */
export async function countPresses(actor: Actor, shopId: string): Promise<number> {
  const [row] = await db
    .select({ n: count() })
    .from(presses)
    .innerJoin(memberships, and(eq(memberships.shopId, presses.shopId), eq(memberships.userId, actor.userId)))
    .where(eq(presses.shopId, shopId));
  return row?.n ?? 0;
}

export type PressDetail = PressSummary & {
  bedWidthMm: number | null;
  bedDepthMm: number | null;
  workingPressureBar: number | null;
  notes: string | null;
  createdAt: Date;
  /** The shop's ISO 4217 code, for part costs. */
  currency: string;
  role: Role;
};

/**
 * A press as one of its shop's members sees it (null: not a member, or no such press). Memoised
 * for one server render with React's `cache`, so a page that loads ten lists of one press reads
 * the press and the membership once (`pressAccess` uses it for plain reads): every data function
 * still checks its own action against the role, and outside a render (route handlers, actions,
 * tests) `cache` memoises nothing.
 */
export const memberPress = cache(async (userId: string, pressId: string): Promise<PressDetail | null> => {
  const [row] = await db
    .select({
      ...summaryColumns,
      bedWidthMm: presses.bedWidthMm,
      bedDepthMm: presses.bedDepthMm,
      workingPressureBar: presses.workingPressureBar,
      notes: presses.notes,
      createdAt: presses.createdAt,
      currency: shops.currency,
      role: memberships.role,
    })
    .from(presses)
    .innerJoin(memberships, and(eq(memberships.shopId, presses.shopId), eq(memberships.userId, userId)))
    .innerJoin(shops, eq(shops.id, presses.shopId))
    .where(eq(presses.id, pressId))
    .limit(1);
  return row ?? null;
});

/**
 * One press with the actor's role in its shop. Authorization: members of the press's shop;
 * for anyone else — or an id that does not exist — NotFoundError.
 */
export async function getPress(actor: Actor, pressId: string): Promise<PressDetail> {
  const row = await memberPress(actor.userId, pressId);
  if (!row) throw new NotFoundError("Press not found");
  return row;
}

export type PlannedPressInput = {
  name: string;
  frameType: (typeof FRAME_TYPES)[number];
  /** Validated sizing input (SI), kept on the press so the plan can be reopened. */
  input: SizingInput;
};

/**
 * Saves a sizing as a planned press in a shop: rated force = extend force at the relief setting,
 * with the stroke and both pressures copied from the input. Authorization: the actor must be a
 * member of the shop (else NotFoundError) whose role may edit presses (managers; else ForbiddenError).
 */
export async function createPlannedPressFromSizing(actor: Actor, shopId: string, plan: PlannedPressInput): Promise<{ id: string }> {
  const role = await roleIn(actor, shopId);
  if (!role) throw new NotFoundError("Shop not found");
  assertCan(role, "editPress");
  const result = evaluateSizing(plan.input); // throws SizingInputError for input it cannot size
  const id = newId();
  await db.transaction(async (tx) => {
    await tx.insert(presses).values({
      id,
      shopId,
      name: plan.name.trim(),
      frameType: plan.frameType,
      lifecycle: "planned",
      ratedForceKn: result.reliefForceKn,
      strokeMm: plan.input.cylinders.strokeMm,
      workingPressureBar: plan.input.pressureBar,
      reliefPressureBar: result.reliefBar,
      sizingInput: plan.input,
    });
    // The plan's parts become the press's components (not yet bought), so the parts list starts filled in.
    const parts = componentsFromSizing(plan.input);
    if (parts.length > 0) await tx.insert(components).values(parts.map((part) => ({ id: newId(), pressId: id, ...part, purchased: false })));
  });
  return { id };
}
