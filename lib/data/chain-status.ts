import "server-only";
import { and, desc, eq, isNotNull } from "drizzle-orm";
import { db } from "@/db/client";
import { inspections } from "@/db/schema";
import type { Actor } from "./actor";
import { verifyPressChain, type ChainReport } from "./inspection-sign";
import { pressAccess } from "./press-access";

export type ChainStatus = ChainReport & { brokenCount: number; checkedAt: Date };

/**
 * How long a full check of a press's chain stands before a view runs it again. The press page
 * used to recompute the whole chain on every view, a cost that grew with every signed
 * inspection. A result kept in the database would sit beside the rows a tamperer edits, so the
 * result is kept in this process instead, keyed by the chain's newest link: a new signature (or a
 * deleted newest record) changes the key and forces a full check at once; an edit deeper in the
 * chain shows within this window, and "Check now" (GET /api/presses/{id}/inspections/verify)
 * recomputes whenever someone asks.
 */
export const CHAIN_RECHECK_MS = 10 * 60_000;
const MAX_KEPT = 1000;

const kept = new Map<string, { link: string; status: ChainStatus }>();

/**
 * The press's chain check: the kept result while the newest link is unchanged and the result is
 * fresh, else a full `verifyPressChain`. One indexed query per view when nothing changed.
 * Authorization: members of the press's shop.
 */
export async function pressChainStatus(actor: Actor, pressId: string, now = new Date()): Promise<ChainStatus> {
  await pressAccess(db, actor, pressId, "viewPress");
  const [newest] = await db
    .select({ seq: inspections.chainSeq, hash: inspections.chainHash })
    .from(inspections)
    .where(and(eq(inspections.pressId, pressId), isNotNull(inspections.chainSeq)))
    .orderBy(desc(inspections.chainSeq))
    .limit(1);
  const link = newest ? `${newest.seq}:${newest.hash}` : "none";
  const hit = kept.get(pressId);
  if (hit && hit.link === link && now.getTime() - hit.status.checkedAt.getTime() < CHAIN_RECHECK_MS) return hit.status;
  const status = { ...(await verifyPressChain(actor, pressId)), checkedAt: now };
  kept.delete(pressId);
  // Oldest entry out first (a Map keeps insertion order), so memory stays bounded.
  if (kept.size >= MAX_KEPT) kept.delete(kept.keys().next().value!);
  kept.set(pressId, { link, status });
  return status;
}
