import { createHmac } from "node:crypto";
import { describe, expect, it } from "vitest";
import { canonicalRecord, chainLink, GENESIS_LINK, verifyChain, type SignedRecord, type StoredLink } from "@/lib/inspections/chain";

const KEY = "unit-test-chain-key-0123456789abcdef";

function record(seq: number, note = "ok"): SignedRecord {
  return {
    id: `insp${String(seq).padStart(20, "a")}`,
    pressId: "pressaaaaaaaaaaaaaaaaaaa",
    templateName: "Monthly inspection",
    cadence: "monthly",
    signerRole: "inspector",
    result: "pass",
    signedBy: "useraaaaaaaaaaaaaaaaaaa",
    signerName: "Ravi Lindqvist",
    signedAt: new Date(Date.UTC(2026, 10, seq, 9, 30, 0, 125)),
    chainSeq: seq,
    items: [{ key: "welds", area: "frame-welds", text: "No cracks at welds", guidance: "", critical: true, photoOnFail: true, lockout: true, outcome: "pass", note, answeredBy: "useraaaaaaaaaaaaaaaaaaa", answeredAt: new Date(Date.UTC(2026, 10, seq, 9, 0)) }],
  };
}

function chainOf(records: SignedRecord[]): StoredLink[] {
  let prev = GENESIS_LINK;
  return records.map((r) => {
    const chainHash = chainLink(KEY, canonicalRecord(r), prev);
    const link = { record: r, prevHash: prev, chainHash };
    prev = chainHash;
    return link;
  });
}

describe("inspection chain", () => {
  it("uses HMAC-SHA-256 as published (RFC 4231 test case 2)", () => {
    // RFC 4231 §4.3: key "Jefe", data "what do ya want for nothing?".
    expect(createHmac("sha256", "Jefe").update("what do ya want for nothing?").digest("hex")).toBe("5bdcc146bf60754e6a042426089575c75a003f089d2739839dec58b964ec3843");
    // Our link is exactly that HMAC over canonical text, a newline and the previous link.
    expect(chainLink("Jefe", "what do ya want for nothing?", "")).toBe(createHmac("sha256", "Jefe").update("what do ya want for nothing?\n").digest("hex"));
  });

  it("links each record to the one before", () => {
    const links = chainOf([record(1), record(2), record(3)]);
    expect(links[0]?.prevHash).toBe(GENESIS_LINK);
    expect(links[1]?.prevHash).toBe(links[0]?.chainHash);
    expect(links[2]?.chainHash).toMatch(/^[0-9a-f]{64}$/);
    expect(verifyChain(KEY, links)).toEqual([]);
    expect(canonicalRecord(record(1))).toContain('"signedAt":"2026-11-01T09:30:00.125Z"');
  });

  it("names only the record whose content changed", () => {
    const links = chainOf([record(1), record(2), record(3)]);
    const tampered = links.map((l, i) => (i === 1 ? { ...l, record: { ...l.record, items: [{ ...l.record.items[0]!, note: "ok!" }] } } : l));
    expect(verifyChain(KEY, tampered)).toEqual([{ id: record(2).id, chainSeq: 2, reason: "content" }]);
  });

  it("names the record after a removed one, and every record under the wrong key", () => {
    const links = chainOf([record(1), record(2), record(3)]);
    expect(verifyChain(KEY, [links[0]!, links[2]!])).toEqual([{ id: record(3).id, chainSeq: 3, reason: "sequence" }]);
    expect(verifyChain("another key entirely, 32 chars long", links).map((p) => p.chainSeq)).toEqual([1, 2, 3]);
  });

  it("continues a chain checked in batches", () => {
    const links = chainOf([record(1), record(2), record(3)]);
    expect(verifyChain(KEY, links.slice(1), { seq: 2, prev: links[0]!.chainHash! })).toEqual([]);
  });
});
