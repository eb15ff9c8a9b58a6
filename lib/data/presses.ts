import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { memberships, presses } from "@/db/schema";
import { NotFoundError, type Role } from "@/lib/auth/permissions";
import type { Actor } from "./actor";

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

export type PressDetail = PressSummary & {
  bedWidthMm: number | null;
  bedDepthMm: number | null;
  workingPressureBar: number | null;
  notes: string | null;
  role: Role;
};

/**
 * One press with the actor's role in its shop. Authorization: members of the press's shop;
 * for anyone else — or an id that does not exist — NotFoundError.
 */
export async function getPress(actor: Actor, pressId: string): Promise<PressDetail> {
  const [row] = await db
    .select({
      ...summaryColumns,
      bedWidthMm: presses.bedWidthMm,
      bedDepthMm: presses.bedDepthMm,
      workingPressureBar: presses.workingPressureBar,
      notes: presses.notes,
      role: memberships.role,
    })
    .from(presses)
    .innerJoin(memberships, and(eq(memberships.shopId, presses.shopId), eq(memberships.userId, actor.userId)))
    .where(eq(presses.id, pressId))
    .limit(1);
  if (!row) throw new NotFoundError("Press not found");
  return row;
}
