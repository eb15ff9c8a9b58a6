import fc from "fast-check";
import { evaluate, unit } from "mathjs";
import { describe, expect, it } from "vitest";
import {
  KN_PER_TONNE_FORCE,
  L_PER_US_GAL,
  MM_PER_IN,
  N_PER_LBF,
  PA_PER_PSI,
  W_PER_HP,
  convert,
  displayUnit,
  formatNumber,
  formatQuantity,
  fromDisplay,
  parseDisplayInput,
  parseNumberInput,
  toDisplay,
  unitDef,
  unitsOf,
  type QuantityKind,
  type UnitId,
} from "@/lib/units";
import { expectPrinted, expectRel } from "./hydraulics/helpers";

// mathjs is an independent implementation; the factors must agree to far better than 0.1 %.
const MATHJS_REL = 1e-9;
const mathjs = (expression: string, to: string): number => evaluate(expression).toNumber(to);

describe("exact factors", () => {
  it("match the definitions of hydraulics-reference.md §11", () => {
    expect(MM_PER_IN).toBe(25.4); // Source: international inch, exact (a) [FDSD]
    expect(L_PER_US_GAL).toBe(3.785411784); // Source: [FDSD] fdsd.co.uk, 231 in³ exact (a)
    expect(N_PER_LBF).toBe(4.4482216152605); // Source: [LBF] pound-force entry, exact (a)
    expectRel(PA_PER_PSI, 6894.757293168, 1e-12); // computed from formula: lbf / in² (b)
    expectRel(W_PER_HP, 745.69987158, 1e-10); // computed from formula: 550 ft·lbf/s (b)
    expectRel(convert("pressure", 1, "bar", "psi"), 14.503774, 1e-7); // computed from formula (b)
    expect(convert("volume", 1, "gal", "in3")).toBeCloseTo(231, 9); // Source: [PEN] gallon = 231 in³ (a)
  });

  it("keep the three tons apart (trap 1)", () => {
    // Source: [TF] Wikipedia "Ton-force" (a)
    expect(convert("force", 1, "tf", "kN")).toBe(KN_PER_TONNE_FORCE);
    expectRel(convert("force", 1, "shortTon", "kN"), 8.896443230521, 1e-12);
    expectRel(convert("force", 1, "longTon", "kN"), 9.96401641818352, 1e-12);
    expectPrinted(convert("force", 1, "tf", "lbf"), 2204.62, 2); // Source: reference trap 1, printed rounding
    const symbols = (["tf", "shortTon", "longTon"] as const).map((u) => unitDef("force", u).symbol);
    expect(new Set(symbols).size).toBe(3);
    expect(unitDef("force", "shortTon").name).toContain("2000 lbf");
    expect(unitDef("force", "longTon").name).toContain("2240 lbf");
  });
});

describe("against mathjs units (independent library)", () => {
  const cases: Array<[string, number, string, string]> = [
    ["1 inch", convert("length", 1, "in", "mm"), "mm", "length in → mm"],
    ["1 ft", convert("length", 1, "ft", "mm"), "mm", "length ft → mm"],
    ["1 gallon", convert("volume", 1, "gal", "L"), "L", "volume gal → L"],
    ["1 in^3", convert("volume", 1, "in3", "L"), "L", "volume in³ → L"],
    ["1 lbf", convert("force", 1, "lbf", "N"), "N", "force lbf → N"],
    ["1 tonne * gravity", convert("force", 1, "tf", "kN"), "kN", "tonne-force"],
    ["1 ton * gravity", convert("force", 1, "shortTon", "kN"), "kN", "short ton-force (2000 lb mass × g)"],
    ["2240 lbf", convert("force", 1, "longTon", "kN"), "kN", "long ton-force"],
    ["1 psi", convert("pressure", 1, "psi", "kPa"), "kPa", "pressure psi → kPa"],
    ["1 bar", convert("pressure", 1, "bar", "psi"), "psi", "pressure bar → psi"],
    ["1 MPa", convert("pressure", 1, "MPa", "bar"), "bar", "pressure MPa → bar"],
    ["1000 psi", convert("stress", 1, "ksi", "MPa"), "MPa", "stress ksi → MPa"],
    ["1 gallon/minute", convert("flow", 1, "gpm", "L/min"), "L/minute", "flow gpm → L/min"],
    ["1 inch/s", convert("speed", 1, "in/s", "mm/s"), "mm/s", "speed in/s → mm/s"],
    ["1 ft/s", convert("fluidVelocity", 1, "ft/s", "m/s"), "m/s", "velocity ft/s → m/s"],
    ["1 hp", convert("power", 1, "hp", "W"), "W", "power hp → W"],
  ];
  it.each(cases)("%s (%s)", (expression, ours, to) => {
    expectRel(ours, mathjs(expression, to), MATHJS_REL);
  });

  it("converts a 4 in bore at 2500 psi the same way as mathjs", () => {
    const areaMm2 = (Math.PI * convert("length", 4, "in", "mm") ** 2) / 4;
    const forceN = convert("pressure", 2500, "psi", "bar") * 0.1 * areaMm2;
    const viaMathjs = unit(2500, "psi").multiply(unit(Math.PI * 4, "inch^2")).toNumber("N");
    expectRel(forceN, viaMathjs, MATHJS_REL);
  });
});

const KINDS: QuantityKind[] = ["length", "pressure", "flow", "force", "speed", "fluidVelocity", "power", "stress", "volume"];

describe("round trips and display", () => {
  it("every unit of every kind converts there and back (property)", () => {
    for (const kind of KINDS) {
      const ids = unitsOf(kind) as UnitId<QuantityKind>[];
      fc.assert(
        fc.property(
          fc.double({ min: -1e9, max: 1e9, noNaN: true }),
          fc.constantFrom(...ids),
          fc.constantFrom(...ids),
          (value, from, to) => {
            const back = convert(kind, convert(kind, value, from, to), to, from);
            expect(Math.abs(back - value)).toBeLessThanOrEqual(Math.abs(value) * 1e-12 + 1e-300);
          },
        ),
        { numRuns: 200 },
      );
    }
  });

  it("display ↔ base round-trips in both systems (property)", () => {
    fc.assert(
      fc.property(fc.constantFrom(...KINDS), fc.constantFrom("metric", "imperial") as fc.Arbitrary<"metric" | "imperial">, fc.double({ min: 1e-6, max: 1e7, noNaN: true }), (kind, system, base) => {
        expectRel(fromDisplay(kind, toDisplay(kind, base, system), system), base, 1e-12);
      }),
    );
  });

  it("shows metric in SI-based units and imperial in US units", () => {
    expect(KINDS.map((k) => displayUnit(k, "metric").symbol)).toEqual(["mm", "bar", "L/min", "kN", "mm/s", "m/s", "kW", "MPa", "L"]);
    expect(KINDS.map((k) => displayUnit(k, "imperial").symbol)).toEqual(["in", "psi", "US gpm", "US tonf", "in/s", "ft/s", "hp", "ksi", "US gal"]);
    expect(toDisplay("length", 101.6, "imperial")).toBeCloseTo(4, 12);
    expect(fromDisplay("pressure", 2500, "imperial")).toBeCloseTo(172.3689, 4); // computed from formula
  });

  it("throws on a unit that does not exist (plain JS caller)", () => {
    expect(() => convert("length", 1, "furlong" as UnitId<"length">, "mm")).toThrow(RangeError);
  });
});

describe("formatting", () => {
  it.each([
    [31415.93, "31,416"],
    [139.745, "140"],
    [14.2500246, "14.3"],
    [0.4312, "0.431"],
    [9.996, "10.0"],
    [-1234.4, "-1,234"],
    [-0.000123456, "-0.000123"],
    [1e-9, "0.000000"],
    [0, "0"],
    [Number.NaN, "—"],
    [Number.POSITIVE_INFINITY, "—"],
  ])("formatNumber(%s) → %s", (value, text) => {
    expect(formatNumber(value)).toBe(text);
  });

  it("honours the significant digits asked for", () => {
    expect(formatNumber(139.745, 5)).toBe("139.75");
    expect(formatNumber(0.98765, 2)).toBe("0.99");
  });

  it("formats a quantity in the system's unit or a chosen one", () => {
    expect(formatQuantity("force", 139.745, "metric")).toBe("140 kN");
    expect(formatQuantity("force", 139.745, "imperial")).toBe("15.7 US tonf");
    expect(formatQuantity("force", 139.745, "metric", { unit: "tf" })).toBe("14.3 t(f)");
    expect(formatQuantity("pressure", 172.3689, "imperial")).toBe("2,500 psi");
    expect(formatQuantity("fluidVelocity", 2.213, "imperial", { significant: 2 })).toBe("7.3 ft/s");
  });
});

describe("form input", () => {
  it.each([
    ["12.5", 12.5],
    [" 3e2 ", 300],
    [".5", 0.5],
    ["-4", -4],
    ["", null],
    ["abc", null],
    ["1,5", null],
    ["Infinity", null],
    ["12 mm", null],
  ])("parseNumberInput(%j) → %s", (text, value) => {
    expect(parseNumberInput(text)).toBe(value);
  });

  it("turns display input into base units", () => {
    expect(parseDisplayInput("length", "4", "imperial")).toBeCloseTo(101.6, 12);
    expect(parseDisplayInput("flow", "10", "imperial")).toBeCloseTo(37.85411784, 10);
    expect(parseDisplayInput("pressure", "200", "metric")).toBe(200);
    expect(parseDisplayInput("pressure", "x", "metric")).toBeNull();
  });
});
