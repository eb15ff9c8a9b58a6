import "server-only";
import { and, desc, eq, isNotNull, isNull, lt, or, type SQL } from "drizzle-orm";
import { db } from "@/db/client";
import { inspections, memberships, presses } from "@/db/schema";
import type { Actor } from "./actor";
import { pressAccess } from "./press-access";
import { encodeTimeCursor, parseTimeCursor } from "./time-cursor";

export type InspectionSummary = {
  id: string;
  pressId: string;
  pressName: string;
  templateName: string;
  cadence: (typeof inspections.$inferSelect)["cadence"];
  startedAt: Date;
  signedAt: Date | null;
  signerName: string | null;
  result: "pass" | "fail" | null;
};
export type InspectionPage = { rows: InspectionSummary[]; nextCursor: string | null };

export const PAGE_SIZE = 20;

const summaryColumns = {
  id: inspections.id,
  pressId: inspections.pressId,
  pressName: presses.name,
  templateName: inspections.templateName,
  cadence: inspections.cadence,
  startedAt: inspections.startedAt,
  signedAt: inspections.signedAt,
  signerName: inspections.signerName,
  result: inspections.result,
};

function page(rows: InspectionSummary[], limit: number, timeOf: (r: InspectionSummary) => Date): InspectionPage {
  const shown = rows.slice(0, limit);
  const last = shown[shown.length - 1];
  return { rows: shown, nextCursor: rows.length > limit && last ? encodeTimeCursor(timeOf(last), last.id) : null };
}

function before(column: typeof inspections.startedAt | typeof inspections.signedAt, cursor: { at: Date; id: string } | null): SQL | undefined {
  return cursor ? or(lt(column, cursor.at), and(eq(column, cursor.at), lt(inspections.id, cursor.id))) : undefined;
}

/** A press's inspections, newest started first, a page at a time. Authorization: members of its shop. */
export async function listPressInspections(actor: Actor, pressId: string, options: { cursor?: string; limit?: number } = {}): Promise<InspectionPage> {
  await pressAccess(db, actor, pressId, "viewPress");
  const limit = Math.min(options.limit ?? PAGE_SIZE, 100);
  const rows = await db
    .select(summaryColumns)
    .from(inspections)
    .innerJoin(presses, eq(presses.id, inspections.pressId))
    .where(and(eq(inspections.pressId, pressId), before(inspections.startedAt, parseTimeCursor(options.cursor))))
    .orderBy(desc(inspections.startedAt), desc(inspections.id))
    .limit(limit + 1);
  return page(rows, limit, (r) => r.startedAt);
}

/**
 * A shop's inspections in progress (newest first) or signed (newest signature first), a page at a
 * time. Authorization: members of the shop; anyone else gets an empty page.
 */
export async function listShopInspections(actor: Actor, shopId: string, state: "open" | "signed", options: { cursor?: string; limit?: number } = {}): Promise<InspectionPage> {
  const limit = Math.min(options.limit ?? PAGE_SIZE, 100);
  const column = state === "open" ? inspections.startedAt : inspections.signedAt;
  const rows = await db
    .select(summaryColumns)
    .from(inspections)
    .innerJoin(presses, eq(presses.id, inspections.pressId))
    .innerJoin(memberships, and(eq(memberships.shopId, presses.shopId), eq(memberships.userId, actor.userId)))
    .where(and(eq(presses.shopId, shopId), state === "open" ? isNull(inspections.signedAt) : isNotNull(inspections.signedAt), before(column, parseTimeCursor(options.cursor))))
    .orderBy(desc(column), desc(inspections.id))
    .limit(limit + 1);
  return page(rows, limit, (r) => (state === "open" ? r.startedAt : (r.signedAt ?? r.startedAt)));
}
