import { describe, expect, it } from "vitest";
import { canonicalRecord, chainLink, GENESIS_LINK } from "@/lib/inspections/chain";
import { generateShop, scaleConfig, share, TABLE_ORDER, type Row, type ShopContext, type ShopRows } from "@/scripts/scale/generate";

const CONFIG = scaleConfig(0.02);
const ctx = (seed: number): ShopContext => ({ seed, config: CONFIG, anchor: new Date("2026-06-01T00:00:00Z"), passwordHash: "$argon2id$stub", chainKey: "unit-test-chain-key-0123456789abcdef" });
const all = (seed: number): ShopRows[] => Array.from({ length: CONFIG.shops }, (_, i) => generateShop(ctx(seed), i));
const rowsOf = (shops: ShopRows[], table: keyof ShopRows): Row[] => shops.flatMap((s) => s[table]);

describe("scale data generator", () => {
  it("gives the same rows for the same seed and different rows for another", () => {
    expect(JSON.stringify(all(7))).toBe(JSON.stringify(all(7)));
    expect(rowsOf(all(8), "presses").map((p) => p.id)).not.toEqual(rowsOf(all(7), "presses").map((p) => p.id));
  });

  it("makes the configured counts, with the heavy press first in shop 1", () => {
    const shops = all(7);
    expect(CONFIG.shops).toBe(1);
    expect(rowsOf(shops, "shops")).toHaveLength(CONFIG.shops);
    expect(rowsOf(shops, "presses")).toHaveLength(CONFIG.presses);
    expect(rowsOf(shops, "service_entries")).toHaveLength(CONFIG.serviceEntries);
    expect(rowsOf(shops, "inspections")).toHaveLength(CONFIG.inspections);
    expect(rowsOf(shops, "bookings")).toHaveLength(CONFIG.bookings);
    expect(rowsOf(shops, "users")).toHaveLength(5 * CONFIG.shops);
    const heavy = rowsOf(shops, "presses")[0]!.id;
    const of = (table: keyof ShopRows) => rowsOf(shops, table).filter((r) => r.press_id === heavy).length;
    expect(of("components")).toBe(60);
    expect(of("hour_meter_readings")).toBe(CONFIG.heavy.readings);
    expect(of("service_entries")).toBe(CONFIG.heavy.serviceEntries);
    expect(of("inspections")).toBe(CONFIG.heavy.inspections);
    const full = scaleConfig(1);
    expect(full).toMatchObject({ shops: 50, presses: 500, serviceEntries: 100_000, inspections: 20_000, bookings: 50_000, heavy: { parts: 60, readings: 5_000, serviceEntries: 5_000, inspections: 500 } });
  });

  it("never books one press twice at the same time", () => {
    const byPress = new Map<unknown, Row[]>();
    for (const b of rowsOf(all(7), "bookings")) byPress.set(b.press_id, [...(byPress.get(b.press_id) ?? []), b]);
    for (const list of byPress.values()) {
      const sorted = list.map((b) => [(b.starts_at as Date).getTime(), (b.ends_at as Date).getTime()] as const).sort((a, b) => a[0] - b[0]);
      sorted.forEach(([start, end], i) => {
        expect(end).toBeGreaterThan(start);
        if (i > 0) expect(start).toBeGreaterThanOrEqual(sorted[i - 1]![1]);
      });
    }
  });

  it("links every press's inspections into a chain that starts at the genesis link", () => {
    const shops = all(7);
    const byPress = new Map<unknown, Row[]>();
    for (const r of rowsOf(shops, "inspections")) byPress.set(r.press_id, [...(byPress.get(r.press_id) ?? []), r]);
    for (const chain of byPress.values()) {
      chain.forEach((r, i) => {
        expect(r.chain_seq).toBe(i + 1);
        expect(r.prev_hash).toBe(i === 0 ? GENESIS_LINK : chain[i - 1]!.chain_hash);
      });
    }
    // One link recomputed from the stored row and its answers (the verifier's own path is in the integration test).
    const first = rowsOf(shops, "inspections")[0]!;
    const answers = rowsOf(shops, "inspection_answers").filter((a) => a.inspection_id === first.id);
    const items = (JSON.parse(first.items as string) as Record<string, unknown>[]).map((item) => {
      const a = answers.find((x) => x.item_key === item.key)!;
      return { ...item, outcome: a.outcome, note: a.note, answeredBy: a.answered_by, answeredAt: a.answered_at };
    });
    const canonical = canonicalRecord({ id: first.id, pressId: first.press_id, templateName: first.template_name, cadence: first.cadence, signerRole: first.signer_role, result: first.result, signedBy: first.signed_by, signerName: first.signer_name, signedAt: first.signed_at, chainSeq: 1, items } as never);
    expect(chainLink(ctx(7).chainKey, canonical, GENESIS_LINK)).toBe(first.chain_hash);
  });

  it("makes each manager a member of the next shop too, so the shop switcher has a choice", () => {
    const two = { ...ctx(7), config: { ...CONFIG, shops: 2, presses: 4 } };
    const [first, second] = [generateShop(two, 0), generateShop(two, 1)];
    const manager = first.users[0]!.id;
    expect([...first.memberships, ...second.memberships].filter((m) => m.user_id === manager).map((m) => [m.shop_id, m.role])).toEqual([
      [first.shops[0]!.id, "manager"],
      [second.shops[0]!.id, "member"],
    ]);
  });

  it("keeps each press's hour meter monotonic and spreads totals evenly", () => {
    let last = new Map<unknown, number>();
    for (const r of rowsOf(all(7), "hour_meter_readings")) {
      expect(r.hours as number).toBeGreaterThan(last.get(r.press_id) ?? 0);
      last = last.set(r.press_id, r.hours as number);
    }
    expect([0, 1, 2].map((i) => share(10, 3, i))).toEqual([4, 3, 3]);
    expect(TABLE_ORDER.indexOf("inspection_answers")).toBeLessThan(TABLE_ORDER.indexOf("inspections"));
  });
});
