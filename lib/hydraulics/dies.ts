/**
 * Dies with their own force limit. The highest gauge reading that keeps a die within its limit is
 * p = F_max / A_cap (gauge pressure, all cylinders together); the press at relief must not exceed
 * it, or the builder must watch the gauge with that die in (computed from the formula).
 */
import { makeCheck, type Fmt } from "./checks";
import { pressureForForceBar } from "./force";
import { FROM_FORMULA } from "./sources";
import type { Check, DieLimitInput, DieLimitResult } from "./types";

export function evaluateDies(dies: readonly DieLimitInput[], capMm2: number, reliefForceKn: number): DieLimitResult[] {
  return dies.map((die) => ({
    name: die.name,
    maxForceKn: die.maxForceKn,
    maxGaugeBar: pressureForForceBar(die.maxForceKn, capMm2),
    exceededAtRelief: die.maxForceKn < reliefForceKn,
  }));
}

export function dieChecks(results: readonly DieLimitResult[], reliefForceKn: number, fmt: Fmt): Check[] {
  return results.map((die, i) => {
    const head = `${die.name}: limit ${fmt("force", die.maxForceKn)}, press at relief ${fmt("force", reliefForceKn)}`;
    return makeCheck(
      `die-limit-${i + 1}`,
      die.exceededAtRelief ? "warn" : "ok",
      die.exceededAtRelief
        ? `${head} — with this die never go above ${fmt("pressure", die.maxGaugeBar)} on the gauge.`
        : `${head}: the press cannot overload it.`,
      "A die's own force limit against the press's force at relief; the gauge limit is the die's force over the cap area.",
      FROM_FORMULA,
    );
  });
}
