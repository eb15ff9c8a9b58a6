/**
 * Rod buckling (Euler) and direct stress at the relief force.
 * P_cr = π²·E·I / (K·L)², I = π·d⁴/64, L = stroke + exposed rod [EZ]; E = 210,000 N/mm² [HAE].
 * K by end fixity from theory [EZ]: fixed–fixed is 0.5 — some calculators print 0.25, which
 * would overstate the load four times.
 */
import { makeCheck, formatFactor, levelForFactor, type Fmt } from "./checks";
import { circleAreaMm2 } from "./force";
import { COMMON_PRACTICE, cite } from "./sources";
import { STEEL_E_N_MM2 } from "./steel";
import type { BucklingInput, BucklingResult, Check, EndFixity } from "./types";

export const END_FIXITY_K: Readonly<Record<EndFixity, number>> = {
  "fixed-fixed": 0.5,
  "fixed-pinned": 0.7,
  "pinned-pinned": 1,
  "fixed-free": 2,
};

/** Lower end of the 3–5 buckling safety factor range [HAE]. */
export const BUCKLING_OK_FACTOR = 3;
/**
 * Our choice: real rods buckle below the Euler load (crookedness, side load, worn guides), so a
 * factor under the frame's floor of 2 is a fail rather than a warning.
 */
export const BUCKLING_FAIL_BELOW = 2;
/** Lowest yield in our steel table (S235JR ≤ 16 mm [EN]); rod steels are usually stronger. */
export const DEFAULT_ROD_YIELD_MPA = 235;

const N_PER_KN = 1000;

export function rodInertiaMm4(rodMm: number): number {
  return (Math.PI * rodMm ** 4) / 64;
}

export function eulerCriticalLoadN(eNmm2: number, inertiaMm4: number, effectiveLengthMm: number): number {
  return (Math.PI ** 2 * eNmm2 * inertiaMm4) / effectiveLengthMm ** 2;
}

/** Slenderness below which a column yields before it buckles: π·√(E / f_y). */
export function transitionSlenderness(yieldMpa: number, eNmm2 = STEEL_E_N_MM2): number {
  return Math.PI * Math.sqrt(eNmm2 / yieldMpa);
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
  const criticalLoadKn = eulerCriticalLoadN(STEEL_E_N_MM2, rodInertiaMm4(rodMm), effectiveLengthMm) / N_PER_KN;
  const slenderness = effectiveLengthMm / (rodMm / 4); // radius of gyration of a round bar is d/4
  const rodYieldMpa = block.rodYieldMpa ?? DEFAULT_ROD_YIELD_MPA;
  const directStressMpa = (loadPerRodKn * N_PER_KN) / circleAreaMm2(rodMm);
  return {
    kFactor,
    unsupportedLengthMm,
    criticalLoadKn,
    loadPerRodKn,
    safetyFactor: criticalLoadKn / loadPerRodKn,
    slenderness,
    eulerApplies: slenderness >= transitionSlenderness(rodYieldMpa),
    directStressMpa,
    rodYieldMpa,
    directSafetyFactor: rodYieldMpa / directStressMpa,
  };
}

export function bucklingChecks(result: BucklingResult, block: BucklingInput, fmt: Fmt): Check[] {
  return [eulerCheck(result, block, fmt), directStressCheck(result, block, fmt)];
}

function eulerCheck(r: BucklingResult, block: BucklingInput, fmt: Fmt): Check {
  const level = levelForFactor(r.safetyFactor, BUCKLING_OK_FACTOR, BUCKLING_FAIL_BELOW);
  let message =
    `Rod over ${fmt("length", r.unsupportedLengthMm)} unsupported, ${block.endFixity} (K = ${r.kFactor}): ` +
    `Euler load ${fmt("force", r.criticalLoadKn)} against ${fmt("force", r.loadPerRodKn)} per rod, factor ${formatFactor(r.safetyFactor)}.`;
  if (!r.eulerApplies) message += " The rod is too stocky for Euler; the direct stress check governs.";
  else if (level !== "ok") message += " Use a thicker rod, a shorter free length or better end guidance.";
  return makeCheck(
    "rod-buckling",
    level,
    message,
    `Euler buckling load / rod load ≥ ${BUCKLING_OK_FACTOR} (warn below, fail below ${BUCKLING_FAIL_BELOW}); L = stroke + exposed rod.`,
    `${cite("EZ", "HAE")}; fail threshold ${COMMON_PRACTICE}`,
  );
}

function directStressCheck(r: BucklingResult, block: BucklingInput, fmt: Fmt): Check {
  const level = levelForFactor(r.directSafetyFactor, 2, 1);
  const assumed = block.rodYieldMpa === undefined ? " (assumed; enter the rod steel's yield)" : "";
  let message =
    `Rod compressive stress ${fmt("stress", r.directStressMpa)} at relief force against yield ` +
    `${fmt("stress", r.rodYieldMpa)}${assumed}, factor ${formatFactor(r.directSafetyFactor)}.`;
  if (level === "fail") message += " The rod would yield.";
  return makeCheck(
    "rod-stress",
    level,
    message,
    "Rod stress = load per rod / rod area; factor on yield ≥ 2 (warn below, fail below 1).",
    `${COMMON_PRACTICE}; default yield ${cite("EN")}`,
  );
}
