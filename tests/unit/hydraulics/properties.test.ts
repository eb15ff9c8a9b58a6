import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { evaluateSizing, gaugeTable, requiredBoreMm, type RatingsInput, type SizingInput } from "@/lib/hydraulics";
import { annulusAreaMm2, circleAreaMm2, forceKn } from "@/lib/hydraulics/force";
import { flowLpmForSpeed, speedMmS } from "@/lib/hydraulics/speed";

const num = (min: number, max: number): fc.Arbitrary<number> =>
  fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const maybe = <T>(arb: fc.Arbitrary<T>): fc.Arbitrary<T | undefined> => fc.option(arb, { nil: undefined });
const grade = fc.constantFrom("S235JR", "S355JR", "A36") as fc.Arbitrary<"S235JR" | "S355JR" | "A36">;

const cylinders = fc
  .record({ count: fc.integer({ min: 1, max: 8 }), boreMm: num(8, 500), rodFraction: num(0.2, 0.8), strokeMm: num(10, 3000) })
  .map(({ rodFraction, ...c }) => ({ ...c, rodMm: c.boreMm * rodFraction }));

const pump: fc.Arbitrary<SizingInput["pump"]> = fc.oneof(
  fc.record({ kind: fc.constant("single" as const), flowLpm: num(0.5, 500) }),
  fc
    .record({ approachFlowLpm: num(1, 500), share: num(0.05, 1), unloadBar: num(5, 400) })
    .map(({ approachFlowLpm, share, unloadBar }) => ({
      kind: "two-stage" as const,
      approachFlowLpm,
      pressingFlowLpm: approachFlowLpm * share,
      unloadBar,
    })),
);

const ratingKeys = ["hoseBar", "valveBar", "pumpBar", "cylinderBar", "gaugeBar"] as const;

/** Any input the engine accepts, optional blocks present or not. */
const validInput: fc.Arbitrary<SizingInput> = fc
  .record({
    cylinders,
    pump,
    pressureBar: num(10, 700),
    reliefFactor: maybe(num(0.8, 1.5)),
    overallEfficiency: maybe(num(0.5, 1)),
    motorKw: maybe(num(0.1, 200)),
    pressFraction: maybe(num(0, 1)),
    lines: maybe(fc.record({ suctionIdMm: maybe(num(4, 100)), pressureIdMm: maybe(num(4, 100)), returnIdMm: maybe(num(4, 100)) })),
    buckling: maybe(
      fc.record({
        endFixity: fc.constantFrom("fixed-fixed", "fixed-pinned", "pinned-pinned", "fixed-free") as fc.Arbitrary<"fixed-fixed">,
        exposedRodMm: num(0, 1000),
        rodYieldMpa: maybe(num(200, 900)),
      }),
    ),
    ratings: maybe(fc.record(Object.fromEntries(ratingKeys.map((k) => [k, maybe(num(10, 1000))])) as Record<keyof RatingsInput, fc.Arbitrary<number | undefined>>)),
    reservoir: maybe(fc.record({ volumeL: num(1, 2000) })),
    plate: maybe(
      fc.record({
        role: fc.constantFrom("crosshead", "bolster") as fc.Arbitrary<"crosshead" | "bolster">,
        spanMm: num(50, 2000),
        widthMm: num(20, 1000),
        thicknessMm: num(5, 150),
        grade,
      }),
    ),
    columns: maybe(fc.record({ count: fc.integer({ min: 1, max: 8 }), diameterMm: num(10, 200), grade })),
    bolster: maybe(
      fc.record({ role: fc.constant("bolster" as const), spanMm: num(50, 2000), thicknessMm: num(5, 150), grade, sectionModulusMm3: num(1e3, 1e7), inertiaMm4: num(1e4, 1e9) }),
    ),
    platen: maybe(
      fc.record({ rodSpacingMm: num(20, 1500), dieWidthMm: num(10, 1500), widthMm: num(20, 1000), thicknessMm: num(5, 150), grade }),
    ),
    throat: maybe(
      fc.record({ depthMm: num(20, 1000), heightMm: num(50, 3000), sectionDepthMm: num(20, 1000), thicknessMm: num(5, 150), grade }),
    ),
    dies: maybe(fc.array(fc.record({ name: fc.constantFrom("Flat", "Drawing", "Fuller"), maxForceKn: num(1, 5000) }), { maxLength: 3 })),
  })
  .map(({ reliefFactor, pressFraction, bolster, ...rest }) => ({
    ...rest,
    plates: bolster && rest.plate?.role !== "bolster" ? [bolster] : undefined,
    reliefBar: reliefFactor === undefined ? undefined : rest.pressureBar * reliefFactor,
    pressDistanceMm: pressFraction === undefined ? undefined : rest.cylinders.strokeMm * pressFraction,
  }));

function everyNumberFinite(value: unknown): boolean {
  if (typeof value === "number") return Number.isFinite(value);
  if (Array.isArray(value)) return value.every(everyNumberFinite);
  if (value && typeof value === "object") return Object.values(value).every(everyNumberFinite);
  return true;
}

describe("engine properties (fast-check)", () => {
  it("never returns NaN or Infinity for valid input", () => {
    fc.assert(fc.property(validInput, (input) => everyNumberFinite(evaluateSizing(input))), { numRuns: 500 });
  });

  it("force grows with pressure and with bore", () => {
    fc.assert(
      fc.property(num(1, 1000), num(1, 1000), num(8, 500), num(1.001, 2), (p, dp, bore, grow) => {
        expect(forceKn(p + dp, circleAreaMm2(bore))).toBeGreaterThan(forceKn(p, circleAreaMm2(bore)));
        expect(forceKn(p, circleAreaMm2(bore * grow))).toBeGreaterThan(forceKn(p, circleAreaMm2(bore)));
      }),
    );
  });

  it("speed × area = flow, in the engine too", () => {
    fc.assert(
      fc.property(num(0.01, 10_000), num(1, 1e6), (flow, area) => {
        expect(Math.abs(flowLpmForSpeed(speedMmS(flow, area), area) - flow)).toBeLessThanOrEqual(flow * 1e-12);
      }),
    );
    fc.assert(
      fc.property(validInput, (input) => {
        const r = evaluateSizing(input);
        const total = input.pump.kind === "single" ? input.pump.flowLpm : input.pump.approachFlowLpm;
        expect(Math.abs(flowLpmForSpeed(r.advanceSpeedMmS, r.capAreaMm2) - total)).toBeLessThanOrEqual(total * 1e-9);
        expect(Math.abs(flowLpmForSpeed(r.retractSpeedMmS, r.annulusAreaMm2) - total)).toBeLessThanOrEqual(total * 1e-9);
      }),
      { numRuns: 200 },
    );
  });

  it("retract force is below extend force for any rod", () => {
    fc.assert(
      fc.property(num(2, 2000), num(0.001, 0.999), num(1, 1000), (bore, rodShare, p) => {
        expect(forceKn(p, annulusAreaMm2(bore, bore * rodShare))).toBeLessThan(forceKn(p, circleAreaMm2(bore)));
      }),
    );
    fc.assert(fc.property(validInput, (input) => evaluateSizing(input).retractForceKn < evaluateSizing(input).forceKn), { numRuns: 200 });
  });

  it("a component rated below relief always yields a fail", () => {
    fc.assert(
      fc.property(validInput, fc.constantFrom(...ratingKeys), num(0.05, 0.9999), (input, key, share) => {
        const relief = input.reliefBar ?? input.pressureBar;
        const r = evaluateSizing({ ...input, ratings: { ...input.ratings, [key]: relief * share } });
        expect(r.checks.find((c) => c.id === `rating-${key.replace(/Bar$/, "")}`)?.level).toBe("fail");
        expect(r.overall).toBe("fail");
      }),
      { numRuns: 300 },
    );
  });

  it("no input with a factor below 2 on any checked member comes back ok: it fails", () => {
    const factors = (r: ReturnType<typeof evaluateSizing>): number[] => [
      ...(r.plates ?? []).map((p) => p.safetyFactor),
      ...[r.columns, r.platen, r.throat].filter((m) => m !== undefined).map((m) => m.safetyFactor),
      ...(r.buckling ? [r.buckling.safetyFactor, r.buckling.directSafetyFactor] : []),
    ];
    let weakSeen = 0;
    fc.assert(
      fc.property(validInput, (input) => {
        const r = evaluateSizing(input);
        if (factors(r).some((f) => f < 2)) {
          weakSeen++;
          expect(r.overall).toBe("fail");
        }
      }),
      { numRuns: 3000 },
    );
    expect(weakSeen).toBeGreaterThan(100); // the generator does reach weak members
  });

  it("ok only when nothing is missing; a missing safety check is never ok", () => {
    fc.assert(
      fc.property(validInput, (input) => {
        const r = evaluateSizing(input);
        if (r.overall === "ok") expect(r.missing).toEqual([]);
        if (r.missing.length > 0) expect(["incomplete", "fail"]).toContain(r.overall);
      }),
      { numRuns: 1000 },
    );
  });

  it("required bore gives back the target force", () => {
    fc.assert(
      fc.property(num(1, 20_000), num(10, 700), fc.integer({ min: 1, max: 8 }), (target, p, count) => {
        const bore = requiredBoreMm(target, p, count);
        expect(Math.abs(forceKn(p, count * circleAreaMm2(bore)) - target)).toBeLessThanOrEqual(target * 1e-12);
      }),
    );
  });

  it("gauge rows rise steadily and end at the relief", () => {
    fc.assert(
      fc.property(num(8, 400), num(10, 700), fc.constantFrom("metric", "imperial") as fc.Arbitrary<"metric" | "imperial">, (bore, relief, system) => {
        const rows = gaugeTable({ cylinders: { count: 1, boreMm: bore }, reliefBar: relief, system });
        for (let i = 1; i < rows.length; i++) expect(rows[i]?.forceKn ?? 0).toBeGreaterThan(rows[i - 1]?.forceKn ?? 0);
        expect(Math.abs((rows.at(-1)?.gaugeBar ?? 0) - relief)).toBeLessThanOrEqual(relief * 1e-9);
      }),
    );
  });
});
