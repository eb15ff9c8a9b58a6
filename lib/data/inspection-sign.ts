import "server-only";
import { appUrl } from "@/lib/app-url";
import { and, asc, desc, eq, gt, inArray, isNotNull } from "drizzle-orm";
import { db } from "@/db/client";
import { inspectionAnswers, inspections, memberships, photos, presses, shops, users } from "@/db/schema";
import { assertRecentSignIn } from "@/lib/auth/recent-sign-in";
import { enqueueEmail } from "@/lib/email/outbox";
import { ConflictError } from "@/lib/errors";
import { tagOutAlertEmail } from "@/lib/inspections/alert-email";
import { canonicalRecord, chainLink, GENESIS_LINK, verifyChain, type ChainProblem, type SignedRecord, type StoredLink } from "@/lib/inspections/chain";
import { inspectionChainKey } from "@/lib/inspections/chain-key";
import { signOffProblems } from "@/lib/inspections/rules";
import type { Actor } from "./actor";
import { recordAudit } from "./audit";
import { inspectionFor, loadAnswers, mergeItems, SIGNED_READ_ONLY } from "./inspections";
import { pressAccess, type Executor } from "./press-access";
import { notifyHoldersOfTagOut } from "./bookings";
import { clearOpenTagOuts, insertTagOut } from "./tag-outs";

export type SignOutcome = { id: string; result: "pass" | "fail"; chainSeq: number; chainHash: string; taggedOut: boolean; clearedTagOuts: number };

/**
 * Signs an inspection: every item answered, a note on every failure, a photo where the item asks
 * for one. Records who and when, and appends the record to the press's chain. A failed critical
 * item tags the press out and queues an alert to the shop's managers in the same transaction; a
 * passing inspection signed by an inspector clears open inspection tag-outs.
 * Authorization: the template's sign action (before-each-use: any member; others: inspectors and
 * managers), with a sign-in in the last few minutes; already signed: ConflictError (409).
 */
export async function signInspection(actor: Actor & { signedInAt: Date }, inspectionId: string): Promise<SignOutcome> {
  const key = inspectionChainKey();
  const outcome = await db.transaction(async (tx) => {
    // Locks the inspection and its press row: one chain append per press at a time.
    const { row, access } = await inspectionFor(tx, actor, inspectionId, "sign", true);
    if (row.signedAt) throw new ConflictError(SIGNED_READ_ONLY);
    assertRecentSignIn(actor.signedInAt);
    const items = mergeItems(row.items, await loadAnswers(tx, inspectionId));
    const failedWithPhotos = await photoCounts(tx, items.filter((i) => i.outcome === "fail").map((i) => i.answerId));
    const problems = signOffProblems(items, failedWithPhotos);
    if (problems.length > 0) throw new ConflictError(`Not ready to sign: ${problems.join(" ")}`);

    const [previous] = await tx
      .select({ chainSeq: inspections.chainSeq, chainHash: inspections.chainHash })
      .from(inspections)
      .where(and(eq(inspections.pressId, row.pressId), isNotNull(inspections.chainSeq)))
      .orderBy(desc(inspections.chainSeq))
      .limit(1);
    const [signer] = await tx.select({ name: users.displayName }).from(users).where(eq(users.id, actor.userId));
    const result = items.some((i) => i.outcome === "fail") ? "fail" : "pass";
    const record: SignedRecord = {
      id: row.id,
      pressId: row.pressId,
      templateName: row.templateName,
      cadence: row.cadence,
      signerRole: row.signerRole,
      result,
      signedBy: actor.userId,
      signerName: signer?.name ?? "",
      signedAt: new Date(),
      chainSeq: (previous?.chainSeq ?? 0) + 1,
      items: items.map(({ answerId: _id, ...item }) => item),
    };
    const prevHash = previous?.chainHash ?? GENESIS_LINK;
    const chainHash = chainLink(key, canonicalRecord(record), prevHash);
    await tx
      .update(inspections)
      .set({ result, signedBy: record.signedBy, signerName: record.signerName, signedAt: record.signedAt, chainSeq: record.chainSeq, prevHash, chainHash })
      .where(eq(inspections.id, row.id));

    const criticalFails = items.filter((i) => i.critical && i.outcome === "fail");
    let clearedTagOuts = 0;
    if (criticalFails.length > 0) {
      const reason = `${row.templateName}: failed ${criticalFails.map((i) => i.text).join("; ")}`;
      await insertTagOut(tx, { pressId: row.pressId, source: "inspection", sourceId: row.id, reason, taggedBy: actor.userId });
      await queueTagOutAlerts(tx, { ...record, shopId: access.shopId, failed: criticalFails });
      await notifyHoldersOfTagOut(tx, row.pressId, reason);
    } else if (result === "pass" && row.signerRole === "inspector") {
      clearedTagOuts = await clearOpenTagOuts(tx, {
        pressId: row.pressId,
        source: "inspection",
        clearedBy: actor.userId,
        clearReason: `Passing re-inspection “${row.templateName}” signed by ${record.signerName}`,
      });
    }
    return { id: row.id, result, chainSeq: record.chainSeq, chainHash, taggedOut: criticalFails.length > 0, clearedTagOuts, shopId: access.shopId } as const;
  });
  await recordAudit({ action: "inspection.signed", userId: actor.userId, shopId: outcome.shopId, detail: { inspectionId, result: outcome.result, chainSeq: outcome.chainSeq } });
  const { shopId: _shop, ...rest } = outcome;
  return rest;
}

async function photoCounts(executor: Executor, answerIds: string[]): Promise<Set<string>> {
  if (answerIds.length === 0) return new Set();
  const rows = await executor.selectDistinct({ id: photos.inspectionItemId }).from(photos).where(inArray(photos.inspectionItemId, answerIds));
  return new Set(rows.flatMap((r) => (r.id ? [r.id] : [])));
}

async function queueTagOutAlerts(executor: Executor, input: SignedRecord & { shopId: string; failed: { text: string; note: string | null }[] }): Promise<void> {
  const [shop] = await executor.select({ name: shops.name }).from(shops).where(eq(shops.id, input.shopId));
  const [press] = await executor.select({ name: presses.name }).from(presses).where(eq(presses.id, input.pressId));
  const managers = await executor
    .select({ id: users.id, email: users.email })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.shopId, input.shopId), eq(memberships.role, "manager")));
  const message = tagOutAlertEmail({
    shopName: shop?.name ?? "",
    pressName: press?.name ?? "",
    templateName: input.templateName,
    signerName: input.signerName,
    signedAt: input.signedAt,
    failed: input.failed,
    link: appUrl(`/inspections/${input.id}`),
  });
  for (const m of managers) {
    await enqueueEmail(executor, { kind: "tag-out-alert", to: m.email, shopId: input.shopId, ...message, dedupeKey: `tag-out-alert:${input.id}:${m.id}` });
  }
}

export type ChainReport = { pressId: string; checked: number; intact: boolean; broken: ChainProblem[] };
const VERIFY_BATCH = 200;
/** At most this many broken records are named in one answer (the count is always complete). */
export const MAX_NAMED_BROKEN = 100;

/**
 * Recomputes a press's chain of signed inspections, in batches so memory stays bounded however
 * long the history, and names every record that no longer matches. Authorization: members of
 * the press's shop.
 */
export async function verifyPressChain(actor: Actor, pressId: string): Promise<ChainReport & { brokenCount: number }> {
  await pressAccess(db, actor, pressId, "viewPress");
  return verifyChainIn(db, pressId);
}

/**
 * The verifier itself, without authorization, against any copy of the schema — the restore drill
 * runs it on a restored database, the scale seed on what it wrote. Callers on behalf of a user go
 * through verifyPressChain.
 */
export async function verifyChainIn(executor: Executor, pressId: string): Promise<ChainReport & { brokenCount: number }> {
  const key = inspectionChainKey();
  const broken: ChainProblem[] = [];
  let brokenCount = 0;
  let checked = 0;
  let carry: StoredLink | null = null;
  for (let after = 0; ; ) {
    const rows = await executor
      .select()
      .from(inspections)
      .where(and(eq(inspections.pressId, pressId), isNotNull(inspections.chainSeq), gt(inspections.chainSeq, after)))
      .orderBy(asc(inspections.chainSeq))
      .limit(VERIFY_BATCH);
    if (rows.length === 0) break;
    const answers = await executor
      .select({ inspectionId: inspectionAnswers.inspectionId, answerId: inspectionAnswers.id, itemKey: inspectionAnswers.itemKey, outcome: inspectionAnswers.outcome, note: inspectionAnswers.note, answeredBy: inspectionAnswers.answeredBy, answeredAt: inspectionAnswers.answeredAt })
      .from(inspectionAnswers)
      .where(inArray(inspectionAnswers.inspectionId, rows.map((r) => r.id)))
      .orderBy(asc(inspectionAnswers.inspectionId), asc(inspectionAnswers.position));
    const links: StoredLink[] = rows.map((r) => ({
      prevHash: r.prevHash,
      chainHash: r.chainHash,
      record: {
        id: r.id,
        pressId: r.pressId,
        templateName: r.templateName,
        cadence: r.cadence,
        signerRole: r.signerRole,
        result: r.result ?? "pass",
        signedBy: r.signedBy ?? "",
        signerName: r.signerName ?? "",
        signedAt: r.signedAt ?? new Date(0),
        chainSeq: r.chainSeq ?? 0,
        items: mergeItems(r.items, answers.filter((a) => a.inspectionId === r.id)).map(({ answerId: _id, ...item }) => item),
      },
    }));
    // The previous batch's last record is re-checked as the start of this one, then dropped.
    const window = carry ? [carry, ...links] : links;
    const problems = verifyChain(key, window, carry ? { seq: carry.record.chainSeq, prev: carry.prevHash ?? "" } : undefined).filter((p) => !carry || p.id !== carry.record.id);
    brokenCount += problems.length;
    broken.push(...problems.slice(0, MAX_NAMED_BROKEN - broken.length));
    checked += rows.length;
    carry = links[links.length - 1] ?? null;
    after = rows[rows.length - 1]?.chainSeq ?? after;
    if (rows.length < VERIFY_BATCH) break;
  }
  return { pressId, checked, intact: brokenCount === 0, broken, brokenCount };
}
