/**
 * Hydraulic power per pump stage and the motor that drives it.
 * P(kW) = p(bar) · Q(L/min) / 600 exactly [HO, LC]: 1 bar · 1 L/min = 10⁵ Pa · 10⁻³ m³ / 60 s = 1/600 kW.
 * Motor input = hydraulic power / overall efficiency, applied once (rules of thumb already include it).
 */
import { makeCheck, type Fmt } from "./checks";
import { FROM_FORMULA, cite } from "./sources";
import type { PumpFlows } from "./speed";
import type { Check, PumpInput } from "./types";

const BAR_LPM_PER_KW = 600;

export const DEFAULT_EFFICIENCY = 0.85;

export function hydraulicPowerKw(pressureBar: number, flowLpm: number): number {
  return (pressureBar * flowLpm) / BAR_LPM_PER_KW;
}

export function motorInputKw(hydraulicKw: number, efficiency: number): number {
  return hydraulicKw / efficiency;
}

/** Highest pressure a motor can hold at a flow: the inverse of the two functions above. */
export function maxPressureForMotorBar(motorKw: number, flowLpm: number, efficiency: number): number {
  return (motorKw * BAR_LPM_PER_KW * efficiency) / flowLpm;
}

export interface StagePowers {
  approachKw: number;
  pressingKw: number;
  motorRequiredKw: number;
  governingStage: "approach" | "pressing";
}

/**
 * The pump reaches the relief setting whenever the ram stalls, so each stage is taken at the
 * highest pressure it can see: the approach stage (total flow) at the unloading setting, capped by
 * relief (two-stage) or at relief (single pump: one stage, so both figures match); the pressing
 * stage at relief with the flow that reaches it — the small section, or the total when the large
 * section never unloads. The motor covers the larger stage: max(Q_total·p_unload, Q_relief·p_relief) / η.
 * A tie (and every single pump) reports "pressing".
 */
export function stagePowers(pump: PumpInput, flows: PumpFlows, reliefBar: number, efficiency: number): StagePowers {
  const approachTopBar = pump.kind === "two-stage" ? Math.min(pump.unloadBar, reliefBar) : reliefBar;
  const approachKw = hydraulicPowerKw(approachTopBar, flows.approachLpm);
  const pressingKw = hydraulicPowerKw(reliefBar, flows.reliefLpm);
  const governingStage = approachKw > pressingKw ? "approach" : "pressing";
  return {
    approachKw,
    pressingKw,
    motorRequiredKw: motorInputKw(Math.max(approachKw, pressingKw), efficiency),
    governingStage,
  };
}

export interface MotorLimits {
  maxPressureForMotorBar: number;
  maxUnloadForMotorBar?: number;
}

/**
 * The highest pressure the motor can hold. With a two-stage pump the motor must first push the
 * total flow up to the unloading setting: if it stalls before that, or the large section never
 * unloads, the total flow sets the limit; otherwise the small section's flow does.
 */
export function motorLimits(motorKw: number, pump: PumpInput, flows: PumpFlows, efficiency: number): MotorLimits {
  if (pump.kind === "single") return { maxPressureForMotorBar: maxPressureForMotorBar(motorKw, flows.reliefLpm, efficiency) };
  const atTotal = maxPressureForMotorBar(motorKw, flows.approachLpm, efficiency);
  const reachesUnload = flows.largeUnloads && atTotal >= pump.unloadBar;
  return {
    maxPressureForMotorBar: reachesUnload ? maxPressureForMotorBar(motorKw, pump.pressingFlowLpm, efficiency) : atTotal,
    maxUnloadForMotorBar: atTotal,
  };
}

export function motorCheck(motorKw: number, powers: StagePowers, fmt: Fmt): Check {
  const short = motorKw < powers.motorRequiredKw;
  const need = fmt("power", powers.motorRequiredKw);
  const message = short
    ? `Motor ${fmt("power", motorKw)} is below the ${need} the ${powers.governingStage} stage needs at its highest pressure; it will stall or overheat.`
    : `Motor ${fmt("power", motorKw)} covers the ${need} the ${powers.governingStage} stage needs.`;
  return makeCheck(
    "motor-power",
    short ? "fail" : "ok",
    message,
    "Motor power ≥ the larger of (total flow × unloading pressure) and (flow reaching relief × relief), divided by overall efficiency; the flow reaching relief is the total when the large section never unloads.",
    `${cite("HO", "ETB", "HP")}; two-stage maximum ${FROM_FORMULA}`,
  );
}
