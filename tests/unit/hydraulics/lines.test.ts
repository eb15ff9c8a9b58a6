import { describe, expect, it } from "vitest";
import { convert } from "@/lib/units";
import { makeFormatter } from "@/lib/hydraulics/checks";
import {
  LINE_RANGES_MS,
  lineChecks,
  lineFlows,
  lineIdForVelocityMm,
  lineVelocities,
  lineVelocityMS,
} from "@/lib/hydraulics/lines";
import { expectRel, gpmToLpm, inToMm, mmToIn } from "./helpers";

const ftPerS = (gpm: number, idIn: number): number =>
  convert("fluidVelocity", lineVelocityMS(gpmToLpm(gpm), inToMm(idIn)), "m/s", "ft/s");

describe("line velocity (reference §4)", () => {
  it("10 gpm in 3/4 in and 5/8 in ID → 7.26 and 10.46 ft/s", () => {
    expectRel(ftPerS(10, 0.75), 7.26); // computed from formula (b)
    expectRel(ftPerS(10, 0.625), 10.46); // computed from formula (b)
  });

  it("agrees with the nomograph readings 7.5 and 10.3 ft/s as far as a nomograph can be read", () => {
    // Source: [SUM] summersrubber.com tech note 166b (a, nomograph read by eye: within 0.3 ft/s)
    expect(Math.abs(ftPerS(10, 0.75) - 7.5)).toBeLessThan(0.3);
    expect(Math.abs(ftPerS(10, 0.625) - 10.3)).toBeLessThan(0.3);
  });

  it("the US factor 0.3208 is a rounding of 231 / (60·12) (trap 5)", () => {
    // Source: [PEN, NL] v(ft/s) = 0.3208·gpm / A(in²) (a); exact factor computed from formula (b)
    const areaIn2 = (Math.PI * 0.75 ** 2) / 4;
    expectRel(ftPerS(10, 0.75), (0.3208 * 10) / areaIn2); // the published factor is within 0.1 %
    expectRel((ftPerS(10, 0.75) * areaIn2) / 10, 231 / 720, 1e-9);
  });

  it("16 gpm at 20 ft/s needs 0.572 in ID: a 5/8 in hose or larger", () => {
    const idIn = mmToIn(lineIdForVelocityMm(gpmToLpm(16), convert("fluidVelocity", 20, "ft/s", "m/s")));
    expectRel(idIn, 0.572); // computed from formula (b)
    expect(idIn).toBeLessThanOrEqual(0.625); // Source: [PK4400] Parker catalog 4400 p.E-3 (a)
  });

  it("the diameter for a velocity gives back that velocity", () => {
    expectRel(lineVelocityMS(60, lineIdForVelocityMm(60, 4.2)), 4.2, 1e-12); // computed from formula (b)
  });
});

describe("line checks against the metric ranges", () => {
  const fmt = makeFormatter("metric");

  it("uses the published ranges", () => {
    // Source: [HYT] hytec-hydraulik.com nominal width (a)
    expect(LINE_RANGES_MS).toEqual({ suction: [0.5, 1.5], pressure: [3, 10], return: [2, 4] });
  });

  it("the return line carries the cap-end oil on retract: more than the pump delivers", () => {
    const flows = lineFlows({ approachLpm: 40, pressingLpm: 8, reliefLpm: 8, largeUnloads: true }, 2000, 1000);
    expect(flows).toEqual({ suction: 40, pressure: 40, return: 80 }); // computed from formula (b)
  });

  it("warns above the range, passes inside and below", () => {
    const flows = { suction: 60, pressure: 60, return: 60 };
    // 60 L/min: suction 20 mm → 3.2 m/s (too fast); pressure 16 mm → 4.97 m/s; return 50 mm → 0.51 m/s
    const v = lineVelocities({ suctionIdMm: 20, pressureIdMm: 16, returnIdMm: 50 }, flows);
    const levels = Object.fromEntries(lineChecks(v, fmt).map((c) => [c.id, c.level]));
    expect(levels).toEqual({ "line-suction": "warn", "line-pressure": "ok", "line-return": "ok" });
    const suction = lineChecks(v, fmt)[0];
    expect(suction?.message).toContain("cavitate");
    expect(suction?.source).toContain("HYT");
  });

  it("checks only the lines given", () => {
    const v = lineVelocities({ pressureIdMm: 10 }, { suction: 20, pressure: 20, return: 20 });
    expect(Object.keys(v)).toEqual(["pressure"]);
    expect(lineChecks(v, fmt).map((c) => c.id)).toEqual(["line-pressure"]);
  });
});
