/**
 * Demo inspections (invented): the workshop's default checklists and a few signed inspections
 * with a valid chain, so the demo shows intact records, something due soon and something overdue.
 */
import { and, eq } from "drizzle-orm";
import type { MySql2Database } from "drizzle-orm/mysql2";
import { canonicalRecord, chainLink, GENESIS_LINK, type SignedRecord } from "../lib/inspections/chain";
import { inspectionChainKey } from "../lib/inspections/chain-key";
import { DEFAULT_TEMPLATES } from "../lib/inspections/defaults";
import { newId } from "../lib/ids";
import * as schema from "./schema";

type Tx = Parameters<Parameters<MySql2Database<typeof schema>["transaction"]>[0]>[0];

/** [press, checklist cadence, signer key, days ago] in the order they were signed. */
const SIGNED: [press: string, cadence: "pre-use" | "weekly" | "monthly", signer: string, daysAgo: number][] = [
  ["Bench C-frame", "monthly", "inspector", 40],
  ["Bay 1 H-frame", "monthly", "inspector", 24],
  ["Bay 1 H-frame", "weekly", "inspector", 6.5],
  ["Bay 1 H-frame", "pre-use", "member1", 2],
];

export async function seedDemoInspections(tx: Tx, shopId: string, userIds: Record<string, string>, names: Record<string, string>): Promise<void> {
  const key = inspectionChainKey();
  const templates = DEFAULT_TEMPLATES.map((t) => ({ id: newId(), shopId, ...t }));
  await tx.insert(schema.inspectionTemplates).values(templates);
  const lastLink = new Map<string, { seq: number; hash: string }>();
  for (const [pressName, cadence, signerKey, daysAgo] of SIGNED) {
    const [press] = await tx.select({ id: schema.presses.id }).from(schema.presses).where(and(eq(schema.presses.shopId, shopId), eq(schema.presses.name, pressName)));
    const template = templates.find((t) => t.cadence === cadence);
    if (!press || !template) continue;
    const signedAt = new Date(Date.now() - daysAgo * 86_400_000);
    const answeredAt = new Date(signedAt.getTime() - 20 * 60_000);
    const signedBy = userIds[signerKey]!;
    const previous = lastLink.get(press.id) ?? { seq: 0, hash: GENESIS_LINK };
    const record: SignedRecord = {
      id: newId(),
      pressId: press.id,
      templateName: template.name,
      cadence: template.cadence,
      signerRole: template.signerRole,
      result: "pass",
      signedBy,
      signerName: names[signerKey]!,
      signedAt,
      chainSeq: previous.seq + 1,
      items: template.items.map((item) => ({ ...item, outcome: item.key === "die-holders" ? "na" : "pass", note: item.key === "die-holders" ? "No dies fitted this month." : null, answeredBy: signedBy, answeredAt })),
    };
    const chainHash = chainLink(key, canonicalRecord(record), previous.hash);
    // Answers go in while the inspection is still unsigned: the triggers refuse them afterwards.
    await tx.insert(schema.inspections).values({ id: record.id, pressId: press.id, templateId: template.id, templateName: template.name, cadence: template.cadence, signerRole: template.signerRole, items: template.items, startedBy: signedBy, startedAt: answeredAt });
    await tx.insert(schema.inspectionAnswers).values(
      record.items.map((item, position) => ({ id: newId(), inspectionId: record.id, itemKey: item.key, position, outcome: item.outcome, note: item.note, answeredBy: signedBy, answeredAt })),
    );
    await tx
      .update(schema.inspections)
      .set({ result: "pass", signedBy, signerName: record.signerName, signedAt, chainSeq: record.chainSeq, prevHash: previous.hash, chainHash })
      .where(eq(schema.inspections.id, record.id));
    lastLink.set(press.id, { seq: record.chainSeq, hash: chainHash });
  }
}
