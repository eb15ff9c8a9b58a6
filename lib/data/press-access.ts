import "server-only";
import { and, eq } from "drizzle-orm";
import { db, type Database } from "@/db/client";
import { memberships, presses } from "@/db/schema";
import { assertCan, NotFoundError, type Action, type Role } from "@/lib/auth/permissions";
import { ConflictError } from "@/lib/errors";
import type { Actor } from "./actor";
import { memberPress } from "./presses";

type Tx = Parameters<Parameters<Database["transaction"]>[0]>[0];
export type Executor = Database | Tx;

export type PressAccess = { pressId: string; shopId: string; role: Role; lifecycle: (typeof presses.$inferSelect)["lifecycle"]; hourMeter: number };

/**
 * The actor's access to one press, checked for `action`. Not a member of the press's shop (or no
 * such press): NotFoundError. Member without the role: ForbiddenError. `forUpdate` locks the
 * press row for the rest of the transaction.
 */
export async function pressAccess(
  executor: Executor,
  actor: Actor,
  pressId: string,
  action: Action,
  options: { forUpdate?: boolean } = {},
): Promise<PressAccess> {
  // Plain reads share the render's one lookup; transactions and row locks always read afresh.
  if (executor === db && !options.forUpdate) {
    const press = await memberPress(actor.userId, pressId);
    if (!press) throw new NotFoundError("Press not found");
    assertCan(press.role, action);
    return { pressId: press.id, shopId: press.shopId, role: press.role, lifecycle: press.lifecycle, hourMeter: press.hourMeter };
  }
  const query = executor
    .select({ pressId: presses.id, shopId: presses.shopId, role: memberships.role, lifecycle: presses.lifecycle, hourMeter: presses.hourMeter })
    .from(presses)
    .innerJoin(memberships, and(eq(memberships.shopId, presses.shopId), eq(memberships.userId, actor.userId)))
    .where(eq(presses.id, pressId))
    .limit(1);
  const [row] = options.forUpdate ? await query.for("update") : await query;
  if (!row) throw new NotFoundError("Press not found");
  assertCan(row.role, action);
  return row;
}

/** Retired presses are a closed record: no edits to them or their parts. */
export function assertNotRetired(access: PressAccess): void {
  if (access.lifecycle === "retired") throw new ConflictError("This press is retired; its record can no longer be changed.");
}
