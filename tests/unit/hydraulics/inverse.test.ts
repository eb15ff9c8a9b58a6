import { describe, expect, it } from "vitest";
import { convert } from "@/lib/units";
import { circleAreaMm2, forceKn } from "@/lib/hydraulics/force";
import { INCH_BORES_IN, ISO_3320_BORES_MM, requiredBoreMm, requiredFlowLpm, suggestBores } from "@/lib/hydraulics/inverse";
import { speedMmS } from "@/lib/hydraulics/speed";
import { expectPrinted, expectRel, inToMm, psiToBar } from "./helpers";

describe("required bore", () => {
  it("gives the target force back at the target pressure", () => {
    const bore = requiredBoreMm(300, 200, 2);
    expectRel(forceKn(200, 2 * circleAreaMm2(bore)), 300, 1e-12); // computed from formula (b)
  });

  it("20 long tons at 9,126 psi needs a 2.5 in ram", () => {
    // Source: [ITI] itidirect.co.uk "ram gauges" (a), printed rounding
    const bore = requiredBoreMm(convert("force", 20, "longTon", "kN"), psiToBar(9126));
    expectPrinted(bore / 25.4, 2.5, 3);
  });

  it("30 t(f) at 200 bar: 136.8 mm, so 125 or 160 mm ISO, 5 or 6 in", () => {
    const s = suggestBores({ forceKn: convert("force", 30, "tf", "kN"), pressureBar: 200, count: 1 });
    expectRel(s.requiredBoreMm, 136.85); // computed from formula (b)
    expect([s.metric.below?.label, s.metric.atOrAbove?.label]).toEqual(["125 mm", "160 mm"]);
    expect([s.inch.below?.label, s.inch.atOrAbove?.label]).toEqual(["5 in", "6 in"]);
    expect(s.metric.atOrAbove?.forceKn).toBeGreaterThan(convert("force", 30, "tf", "kN"));
    expect(s.metric.below?.pressureForTargetBar).toBeGreaterThan(200);
    expectRel(s.inch.atOrAbove?.boreMm ?? 0, inToMm(6), 1e-12);
  });

  it("an exact standard bore is its own match; beyond the series one side is empty", () => {
    const exact = suggestBores({ forceKn: forceKn(250, circleAreaMm2(63)), pressureBar: 250, count: 1 });
    expect(exact.metric.atOrAbove?.boreMm).toBe(63);
    expect(exact.metric.below?.boreMm).toBe(50);
    const huge = suggestBores({ forceKn: 50_000, pressureBar: 100, count: 1 });
    expect(huge.metric.atOrAbove).toBeUndefined();
    expect(huge.metric.below?.boreMm).toBe(500);
    const tiny = suggestBores({ forceKn: 0.1, pressureBar: 100, count: 1 });
    expect(tiny.metric.below).toBeUndefined();
    expect(tiny.metric.atOrAbove?.boreMm).toBe(8);
  });

  it("uses the ISO 3320 series (from memory) and the common inch sizes", () => {
    expect(ISO_3320_BORES_MM).toEqual([8, 10, 12, 16, 20, 25, 32, 40, 50, 63, 80, 100, 125, 160, 200, 250, 320, 400, 500]);
    expect(INCH_BORES_IN).toEqual([1.5, 2, 2.5, 3, 3.25, 3.5, 4, 4.5, 5, 6, 7, 8, 10, 12]);
  });
});

describe("required flow", () => {
  it("0.833 m/s on a 4.00 cm² piston needs 20 L/min", () => {
    // Source: [LC] learnchannel-tv.com (a data), printed rounding
    const boreFor4cm2 = Math.sqrt((4 * 400) / Math.PI);
    expectPrinted(requiredFlowLpm(833.3, boreFor4cm2), 20, 1);
  });

  it("inverts the speed formula for several cylinders", () => {
    const flow = requiredFlowLpm(25, 100, 3);
    expectRel(speedMmS(flow, 3 * circleAreaMm2(100)), 25, 1e-12); // computed from formula (b)
  });
});
