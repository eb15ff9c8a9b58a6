/**
 * Years of invented history on one press, for measuring (scripts/seed-heavy-press.ts) and for the
 * browser test that checks the press page does not grow with it: installed and replaced parts,
 * hour-meter readings, service-log entries, signed inspections on a valid chain, photos, problem
 * reports and cleared tag-outs. Rows go in in batches; nothing here is authorised — callers are
 * scripts and tests that pick the press themselves.
 */
import { desc, eq, isNotNull, and } from "drizzle-orm";
import type { MySql2Database } from "drizzle-orm/mysql2";
import { canonicalRecord, chainLink, GENESIS_LINK, type SignedRecord } from "../lib/inspections/chain";
import { inspectionChainKey } from "../lib/inspections/chain-key";
import { DEFAULT_TEMPLATES } from "../lib/inspections/defaults";
import { newId } from "../lib/ids";
import * as schema from "./schema";

type Db = MySql2Database<typeof schema>;

export type HeavyCounts = {
  /** Parts installed on top of what the press has (dies, harmless to the as-built check). */
  installedParts: number;
  /** Filters replaced one after another: each a removed part pointing at its successor. */
  replacedParts: number;
  readings: number;
  serviceEntries: number;
  inspections: number;
  photos: number;
  /** Closed problem reports (plus two open ones). */
  problems: number;
  /** Cleared tag-outs. */
  tagOuts: number;
};

/** The figures of issue 13: a press after a few years of use. */
export const HEAVY_COUNTS: HeavyCounts = { installedParts: 50, replacedParts: 60, readings: 5000, serviceEntries: 5000, inspections: 500, photos: 300, problems: 200, tagOuts: 200 };

const DAY_MS = 86_400_000;
const BATCH = 500;

async function insertBatched<T>(rows: T[], insert: (batch: T[]) => Promise<unknown>): Promise<void> {
  for (let i = 0; i < rows.length; i += BATCH) await insert(rows.slice(i, i + BATCH));
}

const isoDay = (d: Date): string => d.toISOString().slice(0, 10);

/**
 * Adds `counts` of history to the press, dated back from `now`, recorded by `userId` (a member of
 * its shop). Labels carry `tag` so two runs (or two presses) stay distinguishable.
 */
export async function addHeavyHistory(db: Db, pressId: string, userId: string, counts: HeavyCounts, tag = "H", now = new Date()): Promise<void> {
  const [press] = await db.select({ hourMeter: schema.presses.hourMeter }).from(schema.presses).where(eq(schema.presses.id, pressId));
  if (!press) throw new Error(`No press ${pressId}`);
  const [user] = await db.select({ name: schema.users.displayName }).from(schema.users).where(eq(schema.users.id, userId));
  if (!user) throw new Error(`No user ${userId}`);
  const daysBack = Math.max(30, Math.ceil(counts.readings / 4));
  const dayAgo = (i: number, of: number) => new Date(now.getTime() - DAY_MS * (daysBack - (i * daysBack) / Math.max(1, of)));

  // Parts: extra dies, and a chain of replaced return filters ending in the installed one.
  const dies = Array.from({ length: counts.installedParts }, (_, i) => ({
    id: newId(),
    pressId,
    kind: "die" as const,
    label: `Die ${tag}-${String(i + 1).padStart(4, "0")}`,
    spec: { kind: "die" as const, purpose: `Bending die no. ${i + 1}` },
    installedOn: isoDay(dayAgo(i, counts.installedParts)),
  }));
  const filterIds = Array.from({ length: counts.replacedParts + 1 }, () => newId());
  const filters = filterIds.map((id, i) => ({
    id,
    pressId,
    kind: "filter" as const,
    label: `Return filter ${tag}-${String(i + 1).padStart(4, "0")}`,
    spec: { kind: "filter" as const, location: "return" as const, ratingMicron: 10 },
    installedOn: isoDay(dayAgo(i, counts.replacedParts + 1)),
    removedOn: i < counts.replacedParts ? isoDay(dayAgo(i + 1, counts.replacedParts + 1)) : null,
    removalReason: i < counts.replacedParts ? "Element due by the service plan" : null,
    replacedById: i < counts.replacedParts ? filterIds[i + 1]! : null,
  }));
  await insertBatched([...dies, ...filters], (b) => db.insert(schema.components).values(b));

  // Hour-meter readings climbing to above today's meter, the press's meter moved to the last one.
  const start = press.hourMeter;
  const readings = Array.from({ length: counts.readings }, (_, i) => ({ pressId, hours: start + (i + 1) * 0.5, readAt: dayAgo(i + 1, counts.readings + 1), recordedBy: userId, note: i % 10 === 0 ? `Reading ${tag}-${i + 1}` : null }));
  await insertBatched(readings, (b) => db.insert(schema.hourMeterReadings).values(b));
  if (readings.length > 0) await db.update(schema.presses).set({ hourMeter: readings[readings.length - 1]!.hours }).where(eq(schema.presses.id, pressId));

  const kinds = ["oil-topped-up", "leak-fixed", "other", "filter-changed"] as const;
  const entries = Array.from({ length: counts.serviceEntries }, (_, i) => ({
    id: newId(),
    pressId,
    kind: kinds[i % kinds.length]!,
    performedOn: isoDay(dayAgo(i, counts.serviceEntries)),
    hours: start + i * 0.4,
    parts: [],
    costCents: 1200 + (i % 7) * 100,
    notes: `Service note ${tag}-${String(i + 1).padStart(5, "0")}`,
    performedBy: userId,
  }));
  await insertBatched(entries, (b) => db.insert(schema.serviceEntries).values(b));

  await addSignedInspections(db, pressId, { id: userId, name: user.name }, counts.inspections, (i) => dayAgo(i, counts.inspections));

  const shots = Array.from({ length: counts.photos }, (_, i) => {
    const key = `heavy-${tag}-${newId()}`;
    return {
      id: newId(),
      pressId,
      kind: "other" as const,
      caption: `Photo ${tag}-${String(i + 1).padStart(4, "0")}`,
      uploadedBy: userId,
      fileKey: key,
      fileUrl: `https://files.invalid/${key}`,
      width: 1600,
      height: 1200,
      bytes: 200_000,
      thumbKey: `${key}-t`,
      thumbUrl: `https://files.invalid/${key}-t`,
      thumbWidth: 320,
      thumbHeight: 240,
      thumbBytes: 12_000,
      createdAt: dayAgo(i, counts.photos),
    };
  });
  await insertBatched(shots, (b) => db.insert(schema.photos).values(b));

  const problems = Array.from({ length: counts.problems + 2 }, (_, i) => {
    const closed = i < counts.problems;
    const at = dayAgo(i, counts.problems + 2);
    return {
      id: newId(),
      pressId,
      description: `Problem ${tag}-${String(i + 1).padStart(4, "0")}: weeping fitting`,
      severity: "low" as const,
      reportedBy: userId,
      reportedAt: at,
      closedAt: closed ? new Date(at.getTime() + DAY_MS / 2) : null,
      closedBy: closed ? userId : null,
      closeReason: closed ? "Fitting re-made" : null,
    };
  });
  await insertBatched(problems, (b) => db.insert(schema.problemReports).values(b));

  const tagOuts = Array.from({ length: counts.tagOuts }, (_, i) => {
    const at = dayAgo(i, counts.tagOuts);
    return { id: newId(), pressId, source: "manual" as const, reason: `Tag-out ${tag}-${i + 1}: guard off`, taggedBy: userId, taggedAt: at, clearedAt: new Date(at.getTime() + DAY_MS / 4), clearedBy: userId, clearReason: "Guard refitted" };
  });
  await insertBatched(tagOuts, (b) => db.insert(schema.pressTagOuts).values(b));
}

/** Signed, passing weekly inspections continuing the press's chain, so the verifier finds it intact. */
async function addSignedInspections(db: Db, pressId: string, signer: { id: string; name: string }, n: number, signedAtOf: (i: number) => Date): Promise<void> {
  if (n === 0) return;
  const template = DEFAULT_TEMPLATES.find((t) => t.cadence === "weekly")!;
  const key = inspectionChainKey();
  const [last] = await db
    .select({ seq: schema.inspections.chainSeq, hash: schema.inspections.chainHash })
    .from(schema.inspections)
    .where(and(eq(schema.inspections.pressId, pressId), isNotNull(schema.inspections.chainSeq)))
    .orderBy(desc(schema.inspections.chainSeq))
    .limit(1);
  let previous = { seq: last?.seq ?? 0, hash: last?.hash ?? GENESIS_LINK };
  const signed: { record: SignedRecord; prevHash: string; chainHash: string }[] = [];
  for (let i = 0; i < n; i++) {
    const signedAt = signedAtOf(i);
    const answeredAt = new Date(signedAt.getTime() - 15 * 60_000);
    const record: SignedRecord = {
      id: newId(),
      pressId,
      templateName: template.name,
      cadence: template.cadence,
      signerRole: template.signerRole,
      result: "pass",
      signedBy: signer.id,
      signerName: signer.name,
      signedAt,
      chainSeq: previous.seq + 1,
      items: template.items.map((item) => ({ ...item, outcome: "pass" as const, note: null, answeredBy: signer.id, answeredAt })),
    };
    const chainHash = chainLink(key, canonicalRecord(record), previous.hash);
    signed.push({ record, prevHash: previous.hash, chainHash });
    previous = { seq: record.chainSeq, hash: chainHash };
  }
  // Answers go in while the inspections are unsigned: the triggers refuse them afterwards.
  await insertBatched(signed, (b) =>
    db.insert(schema.inspections).values(
      b.map(({ record }) => ({ id: record.id, pressId, templateId: null, templateName: template.name, cadence: template.cadence, signerRole: template.signerRole, items: template.items, startedBy: signer.id, startedAt: record.items[0]!.answeredAt! })),
    ),
  );
  const answers = signed.flatMap(({ record }) =>
    record.items.map((item, position) => ({ id: newId(), inspectionId: record.id, itemKey: item.key, position, outcome: item.outcome, note: null, answeredBy: signer.id, answeredAt: item.answeredAt })),
  );
  await insertBatched(answers, (b) => db.insert(schema.inspectionAnswers).values(b));
  for (const { record, prevHash, chainHash } of signed) {
    await db
      .update(schema.inspections)
      .set({ result: "pass", signedBy: signer.id, signerName: signer.name, signedAt: record.signedAt, chainSeq: record.chainSeq, prevHash, chainHash })
      .where(eq(schema.inspections.id, record.id));
  }
}
