import { describe, expect, it } from "vitest";
import { convert } from "@/lib/units";
import { makeFormatter } from "@/lib/hydraulics/checks";
import {
  assemblyRatingBar,
  minimumBurstBar,
  ratingChecks,
  typicalHoseWorkingBar,
  type DashSize,
} from "@/lib/hydraulics/hoses";
import { expectRel } from "./helpers";

const fmt = makeFormatter("metric");

describe("hose rules (reference §6)", () => {
  it("SAE J517: minimum burst is 4 × working pressure", () => {
    expect(minimumBurstBar(250)).toBe(1000); // Source: [HAT] hoseassemblytips.com (a)
  });

  it("an assembly is rated at the lower of hose and fittings", () => {
    expect(assemblyRatingBar(275, 250)).toBe(250); // Source: [J517] SAE J517 (2003) (a)
    expect(assemblyRatingBar(200, 350)).toBe(200);
  });

  it("typical ratings depend on size and standard (trap 9)", () => {
    // From memory (c), end points agree with [PKB] Parker blog: 100R1 575–3,250 psi, 100R2 1,150–6,000 psi
    const r1 = ([4, 6, 8, 12, 16] as DashSize[]).map((d) => typicalHoseWorkingBar("100R1AT", d));
    expect(r1).toEqual([...r1].sort((a, b) => b - a)); // larger hose, lower rating
    expectRel(typicalHoseWorkingBar("100R1AT", 4), convert("pressure", 3250, "psi", "bar"), 1e-12);
    expect(typicalHoseWorkingBar("100R2AT", 4)).toBeGreaterThan(typicalHoseWorkingBar("100R1AT", 4));
    expect(typicalHoseWorkingBar("EN 853 2SN", 8)).toBe(275);
    // 100R2AT −4 (5,800 psi) and EN 853 2SN −4 (400 bar) are the same class of hose
    expect(Math.abs(typicalHoseWorkingBar("100R2AT", 4) - typicalHoseWorkingBar("EN 853 2SN", 4))).toBeLessThan(1);
  });
});

describe("component ratings against relief", () => {
  it("fails below relief, warns at relief, passes above", () => {
    const checks = ratingChecks({ hoseBar: 200, valveBar: 210, pumpBar: 250 }, 210, fmt);
    expect(checks.map((c) => [c.id, c.level])).toEqual([
      ["rating-hose", "fail"],
      ["rating-valve", "warn"],
      ["rating-pump", "ok"],
    ]);
    expect(checks[0]?.source).toContain("J1273");
  });

  it("checks cylinder and gauge too, and says what a short gauge does", () => {
    const checks = ratingChecks({ cylinderBar: 160, gaugeBar: 160 }, 200, fmt);
    expect(checks.map((c) => c.level)).toEqual(["fail", "fail"]);
    expect(checks[1]?.message).toContain("off scale");
  });

  it("adds nothing for ratings not given", () => {
    expect(ratingChecks({}, 200, fmt)).toEqual([]);
  });
});
