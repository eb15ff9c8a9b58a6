import { describe, expect, it } from "vitest";
import { convert } from "@/lib/units";
import { annulusAreaMm2, circleAreaMm2 } from "@/lib/hydraulics/force";
import { cycleTimeS, flowLpmForSpeed, pumpFlows, ramSpeeds, speedMmS, sweptVolumeL } from "@/lib/hydraulics/speed";
import { expectPrinted, expectRel, gpmToLpm, in2FromMm2, inToMm, mmToIn } from "./helpers";

const inPerS = (gpm: number, boreIn: number): number => mmToIn(speedMmS(gpmToLpm(gpm), circleAreaMm2(inToMm(boreIn))));

describe("ram speed (reference §2)", () => {
  it("4 in bore at 10 gpm → 3.064 in/s", () => {
    expectRel(inPerS(10, 4), 3.064); // computed from formula (b)
  });

  it("5 in bore at 2.2 and 11 gpm → 0.431 and 2.157 in/s", () => {
    expectRel(inPerS(2.2, 5), 0.431); // computed from formula (b)
    expectRel(inPerS(11, 5), 2.157); // computed from formula (b)
  });

  it("agrees with the published US formula v = 231·Q / (60·A)", () => {
    // Source: [PEN] peninsularcylinders.com, [NF] numberfactory.com (a): the formula itself
    for (const [gpm, bore] of [[3, 2], [12.5, 3.25], [40, 8]] as const) {
      const areaIn2 = (Math.PI * bore * bore) / 4;
      expectRel(inPerS(gpm, bore), (231 * gpm) / (60 * areaIn2), 1e-9);
    }
  });

  it("20 L/min on 4.00 cm² piston, 2.00 cm² annulus → 0.833 and 1.667 m/s", () => {
    // Source: [LC] learnchannel-tv.com (a data, b answers), printed rounding
    const speeds = ramSpeeds({ approachLpm: 20, pressingLpm: 20, reliefLpm: 20, largeUnloads: false }, 400, 200);
    expectPrinted(speeds.advanceMmS / 1000, 0.833, 3);
    expectPrinted(speeds.retractMmS / 1000, 1.667, 3);
  });

  it("flow for a speed undoes speed for a flow", () => {
    expectRel(flowLpmForSpeed(speedMmS(37, 5000), 5000), 37, 1e-12); // computed from formula (b)
  });
});

describe("cylinder volume", () => {
  it("5 in bore × 12 in stroke → 1.020 US gal", () => {
    const litres = sweptVolumeL(circleAreaMm2(inToMm(5)), inToMm(12));
    expectRel(convert("volume", litres, "L", "gal"), 1.02); // computed from formula (b)
    // Source: [PEN] US gal = A·stroke / 231 (a)
    expectRel(convert("volume", litres, "L", "gal"), (in2FromMm2(circleAreaMm2(inToMm(5))) * 12) / 231, 1e-9);
  });
});

describe("pump stages and cycle time", () => {
  it("a single pump gives one flow to both stages; a two-stage pump its total and its small section", () => {
    expect(pumpFlows({ kind: "single", flowLpm: 18 }, 200, 210)).toEqual({ approachLpm: 18, pressingLpm: 18, reliefLpm: 18, largeUnloads: false });
    expect(pumpFlows({ kind: "two-stage", approachFlowLpm: 40, pressingFlowLpm: 8, unloadBar: 50 }, 200, 210)).toEqual({
      approachLpm: 40,
      pressingLpm: 8,
      reliefLpm: 8,
      largeUnloads: true,
    });
  });

  it("retract uses the annulus, so it is faster than advance at the same flow (trap 3)", () => {
    const cap = circleAreaMm2(100);
    const speeds = ramSpeeds({ approachLpm: 30, pressingLpm: 6, reliefLpm: 6, largeUnloads: true }, cap, annulusAreaMm2(100, 50));
    expect(speeds.retractMmS).toBeGreaterThan(speeds.advanceMmS);
    expectRel(speeds.retractMmS / speeds.advanceMmS, 100 ** 2 / (100 ** 2 - 50 ** 2), 1e-12); // computed from formula (b)
  });

  it("cycle = advance over (stroke − press) + press over press distance + retract over stroke", () => {
    const speeds = { advanceMmS: 50, pressingMmS: 10, retractMmS: 80 };
    // computed from formula: 250/50 + 50/10 + 300/80 (b)
    expectRel(cycleTimeS(300, 50, speeds), 5 + 5 + 3.75, 1e-12);
    expectRel(cycleTimeS(300, 0, speeds), 6 + 3.75, 1e-12);
  });
});
