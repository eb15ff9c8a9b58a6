import "server-only";
import { and, asc, count, eq, inArray } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db/client";
import { inspectionAnswerOps, inspectionAnswers, inspections, photos, presses, users, type Outcome, type TemplateItem } from "@/db/schema";
import { can, inspectionAction, NotFoundError, type Role } from "@/lib/auth/permissions";
import { ConflictError } from "@/lib/errors";
import { newId } from "@/lib/ids";
import type { AnswerPatch } from "@/lib/validation/inspection";
import type { Actor } from "./actor";
import { getTemplate } from "./inspection-templates";
import { assertNotRetired, pressAccess, type Executor } from "./press-access";

export type AnswerView = { answerId: string; outcome: Outcome | null; note: string | null; answeredAt: Date | null };
export type InspectionItemView = TemplateItem & AnswerView & { photos: number };

export type InspectionView = {
  id: string;
  pressId: string;
  pressName: string;
  shopId: string;
  templateId: string | null;
  templateName: string;
  cadence: (typeof inspections.$inferSelect)["cadence"];
  signerRole: (typeof inspections.$inferSelect)["signerRole"];
  items: InspectionItemView[];
  startedAt: Date;
  startedByName: string | null;
  result: "pass" | "fail" | null;
  signedAt: Date | null;
  signedBy: string | null;
  signerName: string | null;
  chainSeq: number | null;
  chainHash: string | null;
  role: Role;
  mayPerform: boolean;
  maySign: boolean;
};

export const SIGNED_READ_ONLY = "This inspection is signed: its record can no longer change.";

/**
 * Starts an inspection of a press from one of its shop's checklists, snapshotting the items and
 * creating an empty answer per item. Authorization: the template's perform action on the press
 * (before-each-use: any member; others: inspectors and managers); the template must be of the
 * press's shop (else NotFoundError); not on a retired press.
 */
export async function startInspection(actor: Actor, pressId: string, templateId: string): Promise<{ id: string }> {
  return db.transaction(async (tx) => {
    const template = await getTemplate(actor, templateId, tx);
    const access = await pressAccess(tx, actor, pressId, inspectionAction(template.signerRole, "perform"));
    if (template.shopId !== access.shopId || template.archived) throw new NotFoundError("Checklist not found");
    assertNotRetired(access);
    const id = newId();
    await tx.insert(inspections).values({
      id,
      pressId,
      templateId,
      templateName: template.name,
      cadence: template.cadence,
      signerRole: template.signerRole,
      items: template.items,
      startedBy: actor.userId,
    });
    await tx.insert(inspectionAnswers).values(template.items.map((item, position) => ({ id: newId(), inspectionId: id, itemKey: item.key, position })));
    return { id };
  });
}

type InspectionRow = typeof inspections.$inferSelect;

/** The inspection and the actor's access to its press for `step`; NotFoundError for other shops. */
export async function inspectionFor(executor: Executor, actor: Actor, inspectionId: string, step: "view" | "perform" | "sign", forUpdate = false) {
  const query = executor.select().from(inspections).where(eq(inspections.id, inspectionId)).limit(1);
  const [row] = forUpdate ? await query.for("update") : await query;
  if (!row) throw new NotFoundError("Inspection not found");
  const action = step === "view" ? "viewPress" : inspectionAction(row.signerRole, step);
  const access = await pressAccess(executor, actor, row.pressId, action, { forUpdate });
  return { row, access };
}

export async function loadAnswers(executor: Executor, inspectionId: string) {
  return executor
    .select({
      answerId: inspectionAnswers.id,
      itemKey: inspectionAnswers.itemKey,
      outcome: inspectionAnswers.outcome,
      note: inspectionAnswers.note,
      answeredBy: inspectionAnswers.answeredBy,
      answeredAt: inspectionAnswers.answeredAt,
    })
    .from(inspectionAnswers)
    .where(eq(inspectionAnswers.inspectionId, inspectionId))
    .orderBy(asc(inspectionAnswers.position));
}

/** Snapshot items joined with their answers, in checklist order. */
export function mergeItems(items: readonly TemplateItem[], answers: Awaited<ReturnType<typeof loadAnswers>>): (TemplateItem & AnswerView & { answeredBy: string | null })[] {
  const byKey = new Map(answers.map((a) => [a.itemKey, a]));
  return items.map((item) => {
    const a = byKey.get(item.key);
    return { ...item, answerId: a?.answerId ?? "", outcome: a?.outcome ?? null, note: a?.note ?? null, answeredAt: a?.answeredAt ?? null, answeredBy: a?.answeredBy ?? null };
  });
}

/** One inspection with its items and answers. Authorization: members of its press's shop. */
export async function getInspection(actor: Actor, inspectionId: string): Promise<InspectionView> {
  const { row, access } = await inspectionFor(db, actor, inspectionId, "view");
  const [answers, [press], [starter]] = await Promise.all([
    loadAnswers(db, inspectionId),
    db.select({ name: presses.name }).from(presses).where(eq(presses.id, row.pressId)),
    row.startedBy ? db.select({ name: users.displayName }).from(users).where(eq(users.id, row.startedBy)) : Promise.resolve([]),
  ]);
  const photoCounts = await countPhotos(answers.map((a) => a.answerId));
  return {
    id: row.id,
    pressId: row.pressId,
    pressName: press?.name ?? "",
    shopId: access.shopId,
    templateId: row.templateId,
    templateName: row.templateName,
    cadence: row.cadence,
    signerRole: row.signerRole,
    items: mergeItems(row.items, answers).map(({ answeredBy: _unused, ...item }) => ({ ...item, photos: photoCounts.get(item.answerId) ?? 0 })),
    startedAt: row.startedAt,
    startedByName: starter?.name ?? null,
    result: row.result,
    signedAt: row.signedAt,
    signedBy: row.signedBy,
    signerName: row.signerName,
    chainSeq: row.chainSeq,
    chainHash: row.chainHash,
    role: access.role,
    mayPerform: can(access.role, inspectionAction(row.signerRole, "perform")) && !row.signedAt,
    maySign: can(access.role, inspectionAction(row.signerRole, "sign")) && !row.signedAt,
  };
}

async function countPhotos(answerIds: string[]): Promise<Map<string, number>> {
  if (answerIds.length === 0) return new Map();
  const rows = await db
    .select({ id: photos.inspectionItemId, n: count() })
    .from(photos)
    .where(inArray(photos.inspectionItemId, answerIds))
    .groupBy(photos.inspectionItemId);
  return new Map(rows.map((r) => [r.id ?? "", r.n]));
}

function badItems(row: InspectionRow, patch: AnswerPatch): z.ZodError | null {
  const known = new Set(row.items.map((i) => i.key));
  const issues: z.core.$ZodIssue[] = patch.answers.flatMap((a, index) =>
    known.has(a.itemKey) ? [] : [{ code: "custom" as const, path: ["answers", index, "itemKey"], message: `"${a.itemKey}" is not an item of this checklist.`, input: a.itemKey }],
  );
  return issues.length > 0 ? new z.ZodError(issues) : null;
}

/**
 * Applies answer changes in the order given, each at most once: a change whose `opKey` was
 * applied before is skipped (the phone may resend after losing its connection). All or nothing:
 * an unknown item refuses the whole patch (400) before anything changes. Authorization: the
 * template's perform action; a signed inspection answers ConflictError (409).
 */
export async function updateAnswers(actor: Actor, inspectionId: string, patch: AnswerPatch): Promise<{ applied: number; duplicates: number; items: (AnswerView & { itemKey: string })[] }> {
  return db.transaction(async (tx) => {
    const { row } = await inspectionFor(tx, actor, inspectionId, "perform", true);
    if (row.signedAt) throw new ConflictError(SIGNED_READ_ONLY);
    const invalid = badItems(row, patch);
    if (invalid) throw invalid;
    const keys = patch.answers.map((a) => a.opKey);
    const seen = new Set((await tx.select({ k: inspectionAnswerOps.opKey }).from(inspectionAnswerOps).where(inArray(inspectionAnswerOps.opKey, keys))).map((r) => r.k));
    let applied = 0;
    const now = new Date();
    for (const change of patch.answers) {
      if (seen.has(change.opKey)) continue;
      seen.add(change.opKey);
      await tx
        .update(inspectionAnswers)
        .set({ outcome: change.outcome, note: change.note ?? null, answeredBy: change.outcome ? actor.userId : null, answeredAt: change.outcome ? now : null })
        .where(and(eq(inspectionAnswers.inspectionId, inspectionId), eq(inspectionAnswers.itemKey, change.itemKey)));
      await tx.insert(inspectionAnswerOps).values({ opKey: change.opKey, inspectionId, itemKey: change.itemKey });
      applied += 1;
    }
    const answers = await loadAnswers(tx, inspectionId);
    return { applied, duplicates: patch.answers.length - applied, items: answers.map(({ answeredBy: _unused, ...answer }) => answer) };
  });
}
