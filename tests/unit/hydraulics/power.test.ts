import { describe, expect, it } from "vitest";
import { convert } from "@/lib/units";
import {
  hydraulicPowerKw,
  maxPressureForMotorBar,
  motorCheck,
  motorInputKw,
  motorLimits,
  stagePowers,
} from "@/lib/hydraulics/power";
import { makeFormatter } from "@/lib/hydraulics/checks";
import type { PumpInput } from "@/lib/hydraulics/types";
import { pumpFlows } from "@/lib/hydraulics/speed";
import { expectPrinted, expectRel, gpmToLpm, kwToHp, psiToBar } from "./helpers";

const hp = (psi: number, gpm: number): number => kwToHp(hydraulicPowerKw(psiToBar(psi), gpmToLpm(gpm)));
const fmt = makeFormatter("metric");

describe("hydraulic power (reference §3)", () => {
  it("20 gpm at 1500 psi → 17.5 HP", () => {
    expectPrinted(hp(1500, 20), 17.5, 1); // Source: [ETB] engineeringtoolbox.com hydraulic power (a)
  });

  it("10 gpm at 2000 psi → 11.67 HP ≈ 8.7 kW; motor at 85 % → 13.73 HP", () => {
    // Source: [CL] calculatorlib.com hydraulic horsepower (a), printed rounding
    expectPrinted(hp(2000, 10), 11.67, 2);
    expectPrinted(hydraulicPowerKw(psiToBar(2000), gpmToLpm(10)), 8.7, 1);
    expectRel(motorInputKw(convert("power", hp(2000, 10), "hp", "kW"), 0.85), convert("power", 13.73, "hp", "kW")); // computed from formula (b)
  });

  it("250 bar at 180 L/min → 75 kW; at 87 % → 86 kW input", () => {
    // Source: [HO] hydraulicsonline.com hydraulic calculations (a)
    expect(hydraulicPowerKw(250, 180)).toBe(75);
    expectPrinted(motorInputKw(75, 0.87), 86, 0);
  });

  it("the US divisor 1714 is a rounding of 1714.2857 (trap 5)", () => {
    // psi·gpm per hp, derived from exact unit factors: computed from formula (b)
    const divisor = 1 / hp(1, 1);
    expectRel(divisor, 1714.2857, 1e-7);
    expect(Math.abs(divisor - 1714)).toBeGreaterThan(0.28);
  });

  it("1 HP per gpm at 1500 psi already includes ≈87.5 % efficiency (trap 4)", () => {
    // Source: [HT] hydrotech.com (a) rule of thumb; the efficiency inside it computed from formula (b)
    expectRel(hp(1500, 1), 0.875);
    const motorHp = kwToHp(motorInputKw(hydraulicPowerKw(psiToBar(1500), gpmToLpm(1)), 0.875));
    expectRel(motorHp, 1);
    // Dividing the rule's 1 HP by the efficiency again would ask for 14 % more motor than needed.
    expect(motorHp / 0.875).toBeGreaterThan(1.14);
  });

  it("the highest pressure a motor holds inverts the motor formula", () => {
    const bar = maxPressureForMotorBar(7.5, 12, 0.85);
    expectRel(bar, (7.5 * 600 * 0.85) / 12, 1e-12); // computed from formula (b)
    expectRel(motorInputKw(hydraulicPowerKw(bar, 12), 0.85), 7.5, 1e-12);
  });
});

describe("pump stages and the motor", () => {
  const twoStage: PumpInput = { kind: "two-stage", approachFlowLpm: 40, pressingFlowLpm: 8, unloadBar: 50 };

  it("two-stage: motor covers max(Q_total·p_unload, Q_small·p_relief) / η", () => {
    // computed from formula (b): at 200 bar relief, 40·50 = 2000 > 8·200 = 1600, approach governs
    const at200 = stagePowers(twoStage, pumpFlows(twoStage, 200, 200), 200, 0.85);
    expectRel(at200.approachKw, (40 * 50) / 600, 1e-12);
    expectRel(at200.pressingKw, (8 * 200) / 600, 1e-12);
    expect(at200.governingStage).toBe("approach");
    expectRel(at200.motorRequiredKw, (40 * 50) / 600 / 0.85, 1e-12);
    // at 300 bar, 8·300 = 2400 > 2000: pressing governs
    const at300 = stagePowers(twoStage, pumpFlows(twoStage, 300, 300), 300, 0.85);
    expect(at300.governingStage).toBe("pressing");
    expectRel(at300.motorRequiredKw, (8 * 300) / 600 / 0.85, 1e-12);
    // at 250 bar the stages tie (2000 = 2000); a tie is reported as pressing
    expect(stagePowers(twoStage, pumpFlows(twoStage, 250, 250), 250, 0.85).governingStage).toBe("pressing");
  });

  it("an unloading setting at or above relief: the large section never unloads, so the total flow reaches relief", () => {
    const neverUnloads: PumpInput = { ...twoStage, unloadBar: 400 };
    const flows = pumpFlows(neverUnloads, 190, 200);
    expect(flows).toEqual({ approachLpm: 40, pressingLpm: 40, reliefLpm: 40, largeUnloads: false });
    const powers = stagePowers(neverUnloads, flows, 200, 0.85);
    // computed from formula (b): both stages push 40 L/min to 200 bar → 13.33 kW, /0.85 → 15.69 kW
    expectRel(powers.approachKw, (40 * 200) / 600, 1e-12);
    expectRel(powers.pressingKw, (40 * 200) / 600, 1e-12);
    expectRel(powers.motorRequiredKw, (40 * 200) / 600 / 0.85, 1e-12);
    // unloading exactly at relief never happens either (the relief opens first)
    expect(pumpFlows({ ...twoStage, unloadBar: 200 }, 190, 200).largeUnloads).toBe(false);
  });

  it("an unloading setting above the working pressure presses at the total flow but unloads before relief", () => {
    const flows = pumpFlows({ ...twoStage, unloadBar: 150 }, 120, 200);
    expect(flows).toEqual({ approachLpm: 40, pressingLpm: 40, reliefLpm: 8, largeUnloads: true });
  });

  it("the highest pressure a motor holds follows the total flow when the large section never unloads", () => {
    // The audit's case: 20 kW on a 40 + 8 L/min pump set to unload above relief. computed from formula (b):
    // 20·600·0.85/40 = 255 bar, where the small-section figure 20·600·0.85/8 = 1275 bar is impossible.
    const neverUnloads: PumpInput = { ...twoStage, unloadBar: 250 };
    const limits = motorLimits(20, neverUnloads, pumpFlows(neverUnloads, 200, 210), 0.85);
    expectRel(limits.maxPressureForMotorBar, 255, 1e-12);
    // A motor that stalls before the unloading setting is limited by the total flow too:
    // 2 kW → 2·600·0.85/40 = 25.5 bar < 50 bar unload.
    expectRel(motorLimits(2, twoStage, pumpFlows(twoStage, 200, 210), 0.85).maxPressureForMotorBar, 25.5, 1e-12);
  });

  it("a single pump is one stage at relief", () => {
    const single: PumpInput = { kind: "single", flowLpm: 12 };
    const powers = stagePowers(single, pumpFlows(single, 200, 210), 210, 0.9);
    expect(powers.approachKw).toBe(powers.pressingKw);
    expectRel(powers.motorRequiredKw, (12 * 210) / 600 / 0.9, 1e-12); // computed from formula (b)
  });

  it("motor limits give the unload limit for two-stage pumps only", () => {
    const limits = motorLimits(5.5, twoStage, pumpFlows(twoStage, 200, 210), 0.85);
    expectRel(limits.maxPressureForMotorBar, (5.5 * 600 * 0.85) / 8, 1e-12); // computed from formula (b)
    expectRel(limits.maxUnloadForMotorBar ?? Number.NaN, (5.5 * 600 * 0.85) / 40, 1e-12);
    const single: PumpInput = { kind: "single", flowLpm: 8 };
    expect(motorLimits(5.5, single, pumpFlows(single, 200, 210), 0.85).maxUnloadForMotorBar).toBeUndefined();
  });

  it("a motor below the requirement fails, at or above it passes", () => {
    const powers = stagePowers(twoStage, pumpFlows(twoStage, 300, 300), 300, 0.85);
    expect(motorCheck(powers.motorRequiredKw * 0.99, powers, fmt).level).toBe("fail");
    expect(motorCheck(powers.motorRequiredKw, powers, fmt).level).toBe("ok");
    expect(motorCheck(powers.motorRequiredKw * 0.99, powers, fmt).message).toContain("pressing stage");
  });
});
