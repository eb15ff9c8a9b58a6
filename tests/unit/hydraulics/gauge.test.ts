import { describe, expect, it } from "vitest";
import { convert } from "@/lib/units";
import { GAUGE_TABLE_MAX_ROWS, gaugeTable } from "@/lib/hydraulics/gauge";
import { circleAreaMm2 } from "@/lib/hydraulics/force";
import { expectRel, inToMm } from "./helpers";

describe("gauge card (reference §9)", () => {
  it("metric: every 10 bar up to the relief, which ends on a step", () => {
    const rows = gaugeTable({ cylinders: { count: 1, boreMm: 100 }, reliefBar: 200, system: "metric" });
    expect(rows).toHaveLength(20);
    expect(rows.map((r) => r.gaugeBar)).toEqual(Array.from({ length: 20 }, (_, i) => (i + 1) * 10));
    // Gauge pressure drives the force; atmospheric is never added (trap 2): 10 bar on 7854 mm² = 7.854 kN
    expectRel(rows[0]?.forceKn ?? 0, (10 * circleAreaMm2(100)) / 10_000, 1e-12); // computed from formula (b)
  });

  it("adds a last row at the relief when it falls between steps", () => {
    const rows = gaugeTable({ cylinders: { count: 2, boreMm: 80 }, reliefBar: 215, system: "metric" });
    expect(rows.at(-2)?.gaugeBar).toBe(210);
    expect(rows.at(-1)?.gaugeBar).toBe(215);
  });

  it("imperial: every 100 psi; short tons = psi · A / 2000", () => {
    const boreMm = inToMm(4);
    const rows = gaugeTable({ cylinders: { count: 1, boreMm }, reliefBar: convert("pressure", 2500, "psi", "bar"), system: "imperial" });
    expect(rows).toHaveLength(25);
    const last = rows.at(-1);
    expectRel(last?.gaugePsi ?? 0, 2500, 1e-12);
    // Source: [EH] ehow.com (a) 2500 psi on a 4 in bore → 15.7 short tons; formula (b) gives 15.708
    expectRel(last?.forceShortTons ?? 0, (2500 * Math.PI * 4) / 2000);
    expectRel(last?.forceTonnesForce ?? 0, 14.25); // computed from formula (b)
    expectRel(rows[0]?.forceShortTons ?? 0, (100 * Math.PI * 4) / 2000, 1e-9);
  });

  it("accepts another step and refuses a runaway table", () => {
    expect(gaugeTable({ cylinders: { count: 1, boreMm: 50 }, reliefBar: 700, system: "metric", step: 50 })).toHaveLength(14);
    expect(() => gaugeTable({ cylinders: { count: 1, boreMm: 50 }, reliefBar: 700, system: "metric", step: 0 })).toThrow(RangeError);
    expect(() =>
      gaugeTable({ cylinders: { count: 1, boreMm: 50 }, reliefBar: 700, system: "metric", step: 700 / (GAUGE_TABLE_MAX_ROWS + 1) }),
    ).toThrow(/rows/);
  });
});
