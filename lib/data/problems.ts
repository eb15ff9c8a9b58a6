import "server-only";
import { and, desc, eq, inArray, isNotNull, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { memberships, photos, presses, problemReports, serviceEntries, shops, users, type ProblemSeverity } from "@/db/schema";
import { assertCan, NotFoundError } from "@/lib/auth/permissions";
import { appUrl } from "@/lib/app-url";
import { enqueueEmail } from "@/lib/email/outbox";
import { stopUseReport } from "@/lib/email/shop-messages";
import { ConflictError, FieldError } from "@/lib/errors";
import { newId } from "@/lib/ids";
import { SEVERITY_LABELS } from "@/lib/problem-labels";
import type { Actor } from "./actor";
import { notifyHoldersOfTagOut } from "./bookings";
import { assertNotRetired, pressAccess } from "./press-access";
import { withRetry } from "./retry";
import { clearOpenTagOuts, insertTagOut } from "./tag-outs";


export type ProblemView = {
  id: string;
  description: string;
  severity: ProblemSeverity;
  stopUse: boolean;
  reportedAt: Date;
  reporterName: string | null;
  closedAt: Date | null;
  closeReason: string | null;
  serviceEntryId: string | null;
  photos: { id: string; thumbUrl: string; thumbWidth: number; thumbHeight: number; caption: string | null }[];
};

/** How many closed reports a press page shows; open ones are few by nature but capped too. */
const CLOSED_SHOWN = 10;
const OPEN_CAP = 50;
const PHOTOS_SHOWN = 4;

/**
 * Reports a problem on a press. Authorization: members of its shop (`reportProblem`). With
 * `stopUse` the press is tagged out in the same transaction (its row locked, so no booking slips in
 * between), the shop's managers are e-mailed and so is everyone holding a future booking of it.
 */
export async function reportProblem(
  actor: Actor,
  pressId: string,
  input: { description: string; severity: ProblemSeverity; stopUse: boolean },
  now = new Date(),
): Promise<{ id: string }> {
  return withRetry(() =>
    db.transaction(async (tx) => {
      const access = await pressAccess(tx, actor, pressId, "reportProblem", { forUpdate: input.stopUse });
      assertNotRetired(access);
      const id = newId();
      await tx.insert(problemReports).values({ id, pressId, description: input.description, severity: input.severity, stopUse: input.stopUse, reportedBy: actor.userId, reportedAt: now });
      if (!input.stopUse) return { id };

      await insertTagOut(tx, { pressId, source: "problem", sourceId: id, reason: input.description, taggedBy: actor.userId });
      const [ctx] = await tx
        .select({ pressName: presses.name, shopName: shops.name, reporterName: users.displayName })
        .from(presses)
        .innerJoin(shops, eq(shops.id, presses.shopId))
        .innerJoin(users, eq(users.id, actor.userId))
        .where(eq(presses.id, pressId));
      const managers = await tx
        .select({ email: users.email })
        .from(memberships)
        .innerJoin(users, eq(users.id, memberships.userId))
        .where(and(eq(memberships.shopId, access.shopId), eq(memberships.role, "manager")));
      const message = stopUseReport({
        shopName: ctx!.shopName,
        pressName: ctx!.pressName,
        reporterName: ctx!.reporterName,
        description: input.description,
        severity: SEVERITY_LABELS[input.severity],
        pressUrl: appUrl(`/presses/${pressId}`),
      });
      for (const m of managers) await enqueueEmail(tx, { kind: "problem-report", to: m.email, shopId: access.shopId, ...message });
      await notifyHoldersOfTagOut(tx, pressId, `Stop-use problem reported: ${input.description}`, now);
      return { id };
    }),
  );
}

const viewColumns = {
  id: problemReports.id,
  description: problemReports.description,
  severity: problemReports.severity,
  stopUse: problemReports.stopUse,
  reportedAt: problemReports.reportedAt,
  reporterName: users.displayName,
  closedAt: problemReports.closedAt,
  closeReason: problemReports.closeReason,
  serviceEntryId: problemReports.serviceEntryId,
};

/** Open reports (newest first) and the last few closed ones. Authorization: members of the press's shop. */
export async function listProblems(actor: Actor, pressId: string): Promise<{ open: ProblemView[]; closed: ProblemView[] }> {
  await pressAccess(db, actor, pressId, "viewPress");
  const base = (closed: boolean) =>
    db
      .select(viewColumns)
      .from(problemReports)
      .leftJoin(users, eq(users.id, problemReports.reportedBy))
      .where(and(eq(problemReports.pressId, pressId), closed ? isNotNull(problemReports.closedAt) : isNull(problemReports.closedAt)))
      .orderBy(desc(closed ? problemReports.closedAt : problemReports.reportedAt))
      .limit(closed ? CLOSED_SHOWN : OPEN_CAP);
  const [open, closed] = await Promise.all([base(false), base(true)]);
  // The reports' photos in one query, at most a few each.
  const ids = [...open, ...closed].map((p) => p.id);
  const shots = ids.length
    ? await db
        .select({ id: photos.id, problemReportId: photos.problemReportId, thumbUrl: photos.thumbUrl, thumbWidth: photos.thumbWidth, thumbHeight: photos.thumbHeight, caption: photos.caption })
        .from(photos)
        .where(and(eq(photos.pressId, pressId), inArray(photos.problemReportId, ids)))
        .orderBy(desc(photos.createdAt))
        .limit(PHOTOS_SHOWN * ids.length)
    : [];
  const withPhotos = (p: Omit<ProblemView, "photos">): ProblemView => ({ ...p, photos: shots.filter((s) => s.problemReportId === p.id).slice(0, PHOTOS_SHOWN) });
  return { open: open.map(withPhotos), closed: closed.map(withPhotos) };
}

/**
 * Closes a report with a linked service-log entry or a reason, clearing its tag-out. Authorization:
 * managers and inspectors of the press's shop (`closeProblem`); others in the shop 403, outsiders 404.
 */
export async function closeProblem(actor: Actor, problemId: string, input: { serviceEntryId?: string; reason?: string }, now = new Date()): Promise<void> {
  await withRetry(() =>
    db.transaction(async (tx) => {
      const [row] = await tx
        .select({ pressId: problemReports.pressId, closedAt: problemReports.closedAt, role: memberships.role })
        .from(problemReports)
        .innerJoin(presses, eq(presses.id, problemReports.pressId))
        .innerJoin(memberships, and(eq(memberships.shopId, presses.shopId), eq(memberships.userId, actor.userId)))
        .where(eq(problemReports.id, problemId))
        .for("update");
      if (!row) throw new NotFoundError("Problem report not found");
      assertCan(row.role, "closeProblem");
      if (row.closedAt) throw new ConflictError("This problem report is already closed.");
      if (input.serviceEntryId) {
        // The linked entry must be work logged on this same press.
        const [entry] = await tx
          .select({ id: serviceEntries.id })
          .from(serviceEntries)
          .where(and(eq(serviceEntries.id, input.serviceEntryId), eq(serviceEntries.pressId, row.pressId)))
          .limit(1);
        if (!entry) throw new FieldError("serviceEntryId", "No service-log entry with that id on this press.");
      }
      const reason = input.reason ?? "Dealt with in the service log.";
      await tx
        .update(problemReports)
        .set({ closedAt: now, closedBy: actor.userId, closeReason: reason, serviceEntryId: input.serviceEntryId ?? null })
        .where(eq(problemReports.id, problemId));
      await clearOpenTagOuts(tx, { pressId: row.pressId, source: "problem", sourceId: problemId, clearedBy: actor.userId, clearReason: `Problem report closed: ${reason}` });
    }),
  );
}
