/**
 * Rod buckling and direct stress at the relief force.
 * Slender rods: Euler, P_cr = π²·E·I / (K·L)², I = π·d⁴/64, L = stroke + exposed rod [EZ].
 * Intermediate rods: Johnson's parabola, σ_cr = f_y − (f_y / 2π)²·(KL/r)² / E, below the
 * transition slenderness λc = π·√(2E/f_y), where the two curves meet at σ_cr = f_y / 2 [JOH, PLY].
 * Euler alone overstates the strength of an intermediate rod, so the governing method sets the level.
 * K: the recommended design values for ideal conditions approximated, AISC 360-22 Commentary
 * Table C-A-7.1 — fixed–fixed 0.65, fixed–pinned 0.80, pinned–pinned 1.0, fixed–free 2.1 — not the
 * theoretical 0.5 / 0.7 / 1.0 / 2.0, because a real cylinder mount is never perfectly fixed.
 * E = 210,000 N/mm² [HAE].
 */
import { makeCheck, formatFactor, levelForFactor, type Fmt } from "./checks";
import { circleAreaMm2 } from "./force";
import { COMMON_PRACTICE, cite } from "./sources";
import { STEEL_E_N_MM2 } from "./steel";
import type { BucklingInput, BucklingResult, Check, EndFixity } from "./types";

/** Recommended design K [AISC]. */
export const END_FIXITY_K: Readonly<Record<EndFixity, number>> = {
  "fixed-fixed": 0.65,
  "fixed-pinned": 0.8,
  "pinned-pinned": 1,
  "fixed-free": 2.1,
};

/** Theoretical K [EZ], for reference and tests only. */
export const THEORETICAL_K: Readonly<Record<EndFixity, number>> = {
  "fixed-fixed": 0.5,
  "fixed-pinned": 0.7,
  "pinned-pinned": 1,
  "fixed-free": 2,
};

/** Lower end of the 3–5 buckling safety factor range [HAE]. */
export const BUCKLING_OK_FACTOR = 3;
/** The frame's floor: below a factor of 2 on any member at relief force is a fail (common practice). */
export const MEMBER_FAIL_BELOW = 2;
/** Lowest yield in our steel table (S235JR ≤ 16 mm [EN]); rod steels are usually stronger. */
export const DEFAULT_ROD_YIELD_MPA = 235;

const N_PER_KN = 1000;

export function rodInertiaMm4(rodMm: number): number {
  return (Math.PI * rodMm ** 4) / 64;
}

export function eulerCriticalLoadN(eNmm2: number, inertiaMm4: number, effectiveLengthMm: number): number {
  return (Math.PI ** 2 * eNmm2 * inertiaMm4) / effectiveLengthMm ** 2;
}

/** λc = π·√(2E / f_y): Johnson below, Euler above [JOH, PLY]. */
export function transitionSlenderness(yieldMpa: number, eNmm2 = STEEL_E_N_MM2): number {
  return Math.PI * Math.sqrt((2 * eNmm2) / yieldMpa);
}

/** Johnson's parabola: σ_cr = f_y − f_y²·λ² / (4π²·E) [JOH]. */
export function johnsonStressMpa(yieldMpa: number, slenderness: number, eNmm2 = STEEL_E_N_MM2): number {
  return yieldMpa - (yieldMpa ** 2 * slenderness ** 2) / (4 * Math.PI ** 2 * eNmm2);
}

export function evaluateBuckling(
  rodMm: number,
  strokeMm: number,
  block: BucklingInput,
  loadPerRodKn: number,
): BucklingResult {
  const kFactor = END_FIXITY_K[block.endFixity];
  const unsupportedLengthMm = strokeMm + block.exposedRodMm;
  const effectiveLengthMm = kFactor * unsupportedLengthMm;
  const areaMm2 = circleAreaMm2(rodMm);
  const slenderness = effectiveLengthMm / (rodMm / 4); // radius of gyration of a round bar is d/4
  const rodYieldMpa = block.rodYieldMpa ?? DEFAULT_ROD_YIELD_MPA;
  const lambdaC = transitionSlenderness(rodYieldMpa);
  const method = slenderness >= lambdaC ? "euler" : "johnson";
  const criticalN =
    method === "euler"
      ? eulerCriticalLoadN(STEEL_E_N_MM2, rodInertiaMm4(rodMm), effectiveLengthMm)
      : johnsonStressMpa(rodYieldMpa, slenderness) * areaMm2;
  const criticalLoadKn = criticalN / N_PER_KN;
  const directStressMpa = (loadPerRodKn * N_PER_KN) / areaMm2;
  return {
    kFactor,
    unsupportedLengthMm,
    criticalLoadKn,
    loadPerRodKn,
    safetyFactor: criticalLoadKn / loadPerRodKn,
    slenderness,
    transitionSlenderness: lambdaC,
    method,
    eulerApplies: method === "euler",
    directStressMpa,
    rodYieldMpa,
    directSafetyFactor: rodYieldMpa / directStressMpa,
  };
}

export function bucklingChecks(result: BucklingResult, block: BucklingInput, fmt: Fmt): Check[] {
  return [bucklingCheck(result, block, fmt), directStressCheck(result, block, fmt)];
}

const METHOD_NAME = { euler: "Euler", johnson: "Johnson" } as const;

function bucklingCheck(r: BucklingResult, block: BucklingInput, fmt: Fmt): Check {
  const level = levelForFactor(r.safetyFactor, BUCKLING_OK_FACTOR, MEMBER_FAIL_BELOW);
  const slender = `KL/r ${formatFactor(r.slenderness)} ${r.method === "euler" ? "≥" : "<"} ${formatFactor(r.transitionSlenderness)}`;
  let message =
    `Rod over ${fmt("length", r.unsupportedLengthMm)} unsupported, ${block.endFixity} (design K = ${r.kFactor}), ${slender}: ` +
    `${METHOD_NAME[r.method]} governs, buckling load ${fmt("force", r.criticalLoadKn)} against ${fmt("force", r.loadPerRodKn)} per rod, factor ${formatFactor(r.safetyFactor)}.`;
  if (level !== "ok") message += " Use a thicker rod, a shorter free length or better end guidance.";
  return makeCheck(
    "rod-buckling",
    level,
    message,
    `Buckling load / rod load ≥ ${BUCKLING_OK_FACTOR} (warn below, fail below ${MEMBER_FAIL_BELOW}); Johnson's parabola below λc = π·√(2E/fy), Euler above; L = stroke + exposed rod; K = recommended design value.`,
    `${cite("EZ", "HAE", "JOH", "PLY", "AISC")}; fail threshold ${COMMON_PRACTICE}`,
  );
}

function directStressCheck(r: BucklingResult, block: BucklingInput, fmt: Fmt): Check {
  const level = r.directSafetyFactor < MEMBER_FAIL_BELOW ? "fail" : "ok";
  const assumed = block.rodYieldMpa === undefined ? " (assumed; enter the rod steel's yield)" : "";
  let message =
    `Rod compressive stress ${fmt("stress", r.directStressMpa)} at relief force against yield ` +
    `${fmt("stress", r.rodYieldMpa)}${assumed}, factor ${formatFactor(r.directSafetyFactor)}.`;
  if (level === "fail") message += ` Below ${MEMBER_FAIL_BELOW}: use a thicker or stronger rod.`;
  return makeCheck(
    "rod-stress",
    level,
    message,
    `Rod stress = load per rod / rod area; factor on yield at relief force ≥ ${MEMBER_FAIL_BELOW}, the same floor as the frame.`,
    `${COMMON_PRACTICE}; default yield ${cite("EN")}`,
  );
}
