import { describe, expect, it } from "vitest";
import { makeFormatter } from "@/lib/hydraulics/checks";
import { evaluateReservoir, recommendedOilL, recommendedTankL, reservoirCheck } from "@/lib/hydraulics/reservoir";
import { expectRel } from "./helpers";

describe("reservoir (reference §7)", () => {
  it("40 L/min → 120 L of oil → 150 L tank at 80 % fill", () => {
    expect(recommendedOilL(40)).toBe(120); // Source: [FIR] firgelliauto.com 3 × flow per minute (a); [MC] machinecalcs.com (a)
    expectRel(recommendedTankL(40), 150, 1e-12); // Source: [MC] machinecalcs.com (a)
  });

  it("warns below 3 × flow per minute, passes at or above", () => {
    const fmt = makeFormatter("imperial");
    expect(reservoirCheck(evaluateReservoir(100, 40), fmt).level).toBe("warn");
    expect(reservoirCheck(evaluateReservoir(120, 40), fmt).level).toBe("ok");
    expect(reservoirCheck(evaluateReservoir(100, 40), fmt).message).toContain("US gal");
  });
});
