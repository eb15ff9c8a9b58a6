import { describe, expect, it } from "vitest";
import { convert } from "@/lib/units";
import { makeFormatter } from "@/lib/hydraulics/checks";
import {
  assemblyRatingBar,
  GAUGE_MAX_READING_FRACTION,
  intensifiedBar,
  minimumBurstBar,
  RELIEF_OVERRIDE_FRACTION,
  ratingChecks,
  typicalHoseWorkingBar,
  type DashSize,
} from "@/lib/hydraulics/hoses";
import { annulusAreaMm2, circleAreaMm2 } from "@/lib/hydraulics/force";
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
  it("fails below relief, warns inside the relief valve's 10 % override, passes above it", () => {
    // Hand calculation: relief 210 bar + 10 % override (common practice, from memory) = 231 bar
    const checks = ratingChecks({ hoseBar: 200, valveBar: 210, pumpBar: 230, cylinderBar: 232 }, 210, 1.5, fmt);
    expect(checks.filter((c) => c.id.startsWith("rating-")).map((c) => [c.id, c.level])).toEqual([
      ["rating-hose", "fail"],
      ["rating-valve", "warn"],
      ["rating-pump", "warn"],
      ["rating-cylinder", "ok"],
    ]);
    expect(RELIEF_OVERRIDE_FRACTION).toBe(0.1);
    expect(checks[0]?.source).toContain("J1273");
    expect(checks[2]?.message).toContain("231 bar");
  });

  it("gauge: off scale fails; a relief reading above 75 % of full scale warns; inside the band passes", () => {
    // Source: [CSG] control-specialties.com, expected reading at 50–75 % of full scale (a)
    const level = (fullScale: number) => ratingChecks({ gaugeBar: fullScale }, 200, 1.5, fmt)[0];
    expect(level(160)?.level).toBe("fail");
    expect(level(160)?.message).toContain("off scale");
    // Hand calculation: 200 / 250 = 80 % > 75 % → warn; 200 / 0.75 = 266.7 bar is the smallest gauge that reads it well
    expect(level(250)?.level).toBe("warn");
    expect(level(250)?.message).toContain("267 bar");
    expect(level(266.7)?.level).toBe("ok");
    expect(level(400)?.level).toBe("ok");
    expect(GAUGE_MAX_READING_FRACTION).toBe(0.75);
  });

  it("rod-side intensification: relief × cap area / annulus area against the cylinder's rating", () => {
    // Hand calculation: 100 mm bore, 70 mm rod → A_cap/A_ann = 10000/(10000 − 4900) = 1.9608;
    // 210 bar × 1.9608 = 411.8 bar > 250 bar rating → warn
    const ratio = circleAreaMm2(100) / annulusAreaMm2(100, 70);
    expectRel(intensifiedBar(210, ratio), 411.76, 1e-4);
    const check = ratingChecks({ cylinderBar: 250 }, 210, ratio, fmt).find((c) => c.id === "rod-side-intensification");
    expect(check?.level).toBe("warn");
    expect(check?.message).toContain("412 bar");
    // a thin rod: 100/40 → ratio 1.1905, 210 × 1.1905 = 250.0 bar → just within a 251 bar rating
    const thin = circleAreaMm2(100) / annulusAreaMm2(100, 40);
    expect(ratingChecks({ cylinderBar: 251 }, 210, thin, fmt).find((c) => c.id === "rod-side-intensification")?.level).toBe("ok");
  });

  it("adds nothing for ratings not given", () => {
    expect(ratingChecks({}, 200, 1.5, fmt)).toEqual([]);
  });
});
