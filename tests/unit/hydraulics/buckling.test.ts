import { describe, expect, it } from "vitest";
import { makeFormatter } from "@/lib/hydraulics/checks";
import {
  BUCKLING_FAIL_BELOW,
  BUCKLING_OK_FACTOR,
  END_FIXITY_K,
  bucklingChecks,
  eulerCriticalLoadN,
  evaluateBuckling,
  rodInertiaMm4,
} from "@/lib/hydraulics/buckling";
import { STEEL_E_N_MM2 } from "@/lib/hydraulics/steel";
import type { BucklingInput } from "@/lib/hydraulics/types";
import { expectRel, inToMm, knToLbf, psiToMpa } from "./helpers";

const fmt = makeFormatter("metric");

describe("Euler buckling (reference §5)", () => {
  // d 1.5 in, L 24 in, E 29e6 psi
  const inertiaMm4 = rodInertiaMm4(inToMm(1.5));
  const e = psiToMpa(29e6);
  const lbfAt = (k: number): number => knToLbf(eulerCriticalLoadN(e, inertiaMm4, k * inToMm(24)) / 1000);

  it("I = π·d⁴/64 = 0.24850 in⁴ for a 1.5 in rod", () => {
    expectRel(inertiaMm4 / inToMm(1) ** 4, 0.2485); // computed from formula (b)
  });

  it("K = 1 → 123,484 lbf; K = 2 → 30,871 lbf", () => {
    expectRel(lbfAt(1), 123_484); // computed from formula (b)
    expectRel(lbfAt(2), 30_871); // computed from formula (b)
  });

  it("uses K from theory; fixed–fixed is 0.5, not 0.25 (trap 7)", () => {
    // Source: [EZ] hydraulics.ezvirtualtools.com rod buckling, theory (a)
    expect(END_FIXITY_K).toEqual({ "fixed-fixed": 0.5, "fixed-pinned": 0.7, "pinned-pinned": 1, "fixed-free": 2 });
    // 0.25 would promise four times the load that 0.5 gives
    expectRel(lbfAt(0.25) / lbfAt(0.5), 4, 1e-12);
  });

  it("uses E = 210,000 N/mm² and L = stroke + exposed rod", () => {
    expect(STEEL_E_N_MM2).toBe(210_000); // Source: [HAE] haenchen-hydraulic.com buckling (a)
    const r = evaluateBuckling(40, 500, { endFixity: "pinned-pinned", exposedRodMm: 100 }, 50);
    expect(r.unsupportedLengthMm).toBe(600); // Source: [EZ] unsupported length (a)
    // computed from formula (b)
    expectRel(r.criticalLoadKn, (Math.PI ** 2 * 210_000 * ((Math.PI * 40 ** 4) / 64)) / 600 ** 2 / 1000, 1e-12);
    expectRel(r.safetyFactor, r.criticalLoadKn / 50, 1e-12);
    expectRel(r.slenderness, 600 / 10, 1e-12);
    expectRel(r.directStressMpa, 50_000 / ((Math.PI * 40 ** 2) / 4), 1e-12);
  });
});

describe("buckling checks", () => {
  // A 20 mm rod, pinned-pinned, 1000 mm free: Euler load ≈ 16.28 kN; thresholds from the constants
  const block: BucklingInput = { endFixity: "pinned-pinned", exposedRodMm: 0, rodYieldMpa: 355 };
  const critical = evaluateBuckling(20, 1000, block, 1).criticalLoadKn;
  const levelAt = (factor: number): string =>
    bucklingChecks(evaluateBuckling(20, 1000, block, critical / factor), block, fmt)[0]?.level ?? "none";

  it("is ok from the factor 3 of the 3–5 range, warns below and fails below 2", () => {
    // Source: [HAE] buckling safety factor 3–5 (a); fail threshold our choice (common practice)
    expect(BUCKLING_OK_FACTOR).toBe(3);
    expect(BUCKLING_FAIL_BELOW).toBe(2);
    expect(levelAt(3.2)).toBe("ok");
    expect(levelAt(2.5)).toBe("warn");
    expect(levelAt(1.5)).toBe("fail");
  });

  it("flags a stocky rod where Euler does not apply; direct stress then governs", () => {
    const stocky = evaluateBuckling(80, 100, { endFixity: "fixed-fixed", exposedRodMm: 20 }, 300);
    expect(stocky.eulerApplies).toBe(false);
    expect(bucklingChecks(stocky, { endFixity: "fixed-fixed", exposedRodMm: 20 }, fmt)[0]?.message).toContain("too stocky");
    expect(evaluateBuckling(20, 1000, block, 1).eulerApplies).toBe(true);
  });

  it("direct stress: fail when the rod yields, warn below a factor of 2, and say when yield is assumed", () => {
    const stress = (loadKn: number, yieldMpa?: number): { level: string; message: string } => {
      const b: BucklingInput = { endFixity: "fixed-fixed", exposedRodMm: 0, ...(yieldMpa ? { rodYieldMpa: yieldMpa } : {}) };
      const check = bucklingChecks(evaluateBuckling(50, 100, b, loadKn), b, fmt)[1];
      return { level: check?.level ?? "none", message: check?.message ?? "" };
    };
    const area = (Math.PI * 50 ** 2) / 4; // 1963.5 mm²
    expect(stress((area * 400) / 1000, 355).level).toBe("fail");
    expect(stress((area * 200) / 1000, 355).level).toBe("warn");
    expect(stress((area * 100) / 1000, 355).level).toBe("ok");
    expect(stress((area * 100) / 1000).message).toContain("assumed");
  });
});
