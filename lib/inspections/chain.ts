import { createHmac, timingSafeEqual } from "node:crypto";
import type { Cadence, Outcome, SignerRole, TemplateItem } from "@/db/schema/inspections";
import { canonicalJson } from "./canonical";

/** The link before a press's first signed inspection. */
export const GENESIS_LINK = "0".repeat(64);

/** Everything a signature covers, as stored. Changing any of it breaks the record's link. */
export type SignedRecord = {
  id: string;
  pressId: string;
  templateName: string;
  cadence: Cadence;
  signerRole: SignerRole;
  result: "pass" | "fail";
  signedBy: string;
  signerName: string;
  signedAt: Date;
  chainSeq: number;
  items: (TemplateItem & { outcome: Outcome | null; note: string | null; answeredBy: string | null; answeredAt: Date | null })[];
};

/** The canonical text of a record (version 1 of the format). Items keep their checklist order. */
export function canonicalRecord(record: SignedRecord): string {
  return canonicalJson({
    format: "presswright-inspection/1",
    id: record.id,
    pressId: record.pressId,
    templateName: record.templateName,
    cadence: record.cadence,
    signerRole: record.signerRole,
    result: record.result,
    signedBy: record.signedBy,
    signerName: record.signerName,
    signedAt: record.signedAt.toISOString(),
    chainSeq: record.chainSeq,
    items: record.items.map((i) => ({ ...i, answeredAt: i.answeredAt ? i.answeredAt.toISOString() : null })),
  });
}

/** link(n) = HMAC-SHA-256(key, canonical(n) + "\n" + link(n-1)), lowercase hex. */
export function chainLink(key: string, canonical: string, previousLink: string): string {
  return createHmac("sha256", key).update(`${canonical}\n${previousLink}`, "utf8").digest("hex");
}

export type StoredLink = { record: SignedRecord; prevHash: string | null; chainHash: string | null };
export type ChainProblem = { id: string; chainSeq: number; reason: "content" | "link" | "sequence" };

function sameHex(a: string, b: string): boolean {
  return a.length === b.length && timingSafeEqual(Buffer.from(a), Buffer.from(b));
}

/**
 * Recomputes a press's chain (records in chain order) and names every record that no longer
 * matches: its content no longer gives its stored link ("content"), its stored previous link is
 * not the link of the record before it ("link" — a record removed or re-linked), or its sequence
 * number skips ("sequence"). `start` continues a chain checked in batches.
 */
export function verifyChain(key: string, links: readonly StoredLink[], start: { seq: number; prev: string } = { seq: 1, prev: GENESIS_LINK }): ChainProblem[] {
  const problems: ChainProblem[] = [];
  let expectedPrev = start.prev;
  let expectedSeq = start.seq;
  for (const { record, prevHash, chainHash } of links) {
    const flag = (reason: ChainProblem["reason"]) => problems.push({ id: record.id, chainSeq: record.chainSeq, reason });
    if (record.chainSeq !== expectedSeq) flag("sequence");
    else if (prevHash !== expectedPrev) flag("link");
    else if (!chainHash || !sameHex(chainLink(key, canonicalRecord(record), prevHash), chainHash)) flag("content");
    expectedPrev = chainHash ?? "";
    expectedSeq = record.chainSeq + 1;
  }
  return problems;
}
