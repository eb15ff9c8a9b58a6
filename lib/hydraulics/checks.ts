/**
 * Check building blocks and the checks that cut across topics (relief vs working pressure,
 * efficiency, unloading setting, parallel cylinders).
 */
import { formatNumber, formatQuantity, toDisplay, type QuantityKind, type UnitSystem } from "@/lib/units";
import { COMMON_PRACTICE, cite } from "./sources";
import type { Check, CheckLevel, MissingCheck, OverallLevel, PumpInput } from "./types";

/** Formats base-unit values in the user's units for check messages. */
export interface Fmt {
  (kind: QuantityKind, baseValue: number): string;
  /** "3–10 m/s" */
  range(kind: QuantityKind, low: number, high: number): string;
}

export function makeFormatter(system: UnitSystem): Fmt {
  const one = (kind: QuantityKind, baseValue: number): string => formatQuantity(kind, baseValue, system);
  const range = (kind: QuantityKind, low: number, high: number): string =>
    `${formatNumber(toDisplay(kind, low, system))}–${one(kind, high)}`;
  return Object.assign(one, { range });
}

export function makeCheck(id: string, level: CheckLevel, message: string, rule: string, source: string): Check {
  return { id, level, message, rule, source };
}

const RANK: Record<CheckLevel, number> = { ok: 0, warn: 1, fail: 2 };

export function worstLevel(checks: readonly Check[]): CheckLevel {
  let worst: CheckLevel = "ok";
  for (const c of checks) if (RANK[c.level] > RANK[worst]) worst = c.level;
  return worst;
}

/** Any fail wins; then anything missing makes the design "incomplete"; then the worst level. */
export function overallLevel(checks: readonly Check[], missing: readonly MissingCheck[]): OverallLevel {
  const worst = worstLevel(checks);
  if (worst === "fail") return "fail";
  return missing.length > 0 ? "incomplete" : worst;
}

/** ok at or above `okAt`, fail below `failBelow`, warn between. */
export function levelForFactor(factor: number, okAt: number, failBelow: number): CheckLevel {
  if (factor >= okAt) return "ok";
  return factor < failBelow ? "fail" : "warn";
}

export function formatFactor(factor: number): string {
  return formatNumber(factor, 3);
}

/** Overall efficiency range of the published pump figures [ETB]. */
export const EFFICIENCY_RANGE = [0.8, 0.95] as const;

export interface SanityContext {
  pressureBar: number;
  reliefBar: number;
  efficiency: number;
  pump: PumpInput;
  cylinderCount: number;
  /** False when no relief setting was given and the working pressure was assumed. */
  reliefGiven: boolean;
}

export function sanityChecks(ctx: SanityContext, fmt: Fmt): Check[] {
  const checks = [reliefCheck(ctx, fmt), efficiencyCheck(ctx.efficiency)];
  if (ctx.pump.kind === "two-stage") checks.push(unloadCheck(ctx.pump.unloadBar, ctx.pressureBar, ctx.reliefBar, fmt));
  if (ctx.cylinderCount > 1) checks.push(parallelNote(ctx.cylinderCount));
  return checks;
}

export const RELIEF_ASSUMED = "Relief setting not given: the working pressure was assumed as the relief setting.";

function reliefCheck({ pressureBar, reliefBar, reliefGiven }: SanityContext, fmt: Fmt): Check {
  const rule = "The relief valve is set at or above the working pressure and below the lowest-rated component.";
  if (!reliefGiven) {
    return makeCheck(
      "relief-vs-working",
      "warn",
      `No relief setting given: ${fmt("pressure", pressureBar)} (the working pressure) is assumed. Enter the relief valve's real setting — every rating and frame figure depends on it.`,
      rule,
      COMMON_PRACTICE,
    );
  }
  const below = reliefBar < pressureBar;
  const message = below
    ? `Relief setting ${fmt("pressure", reliefBar)} is below the working pressure ${fmt("pressure", pressureBar)}: the press can never reach its working pressure.`
    : `Relief setting ${fmt("pressure", reliefBar)} covers the working pressure ${fmt("pressure", pressureBar)}.`;
  return makeCheck("relief-vs-working", below ? "fail" : "ok", message, rule, COMMON_PRACTICE);
}

function efficiencyCheck(efficiency: number): Check {
  const [low, high] = EFFICIENCY_RANGE;
  const inside = efficiency >= low && efficiency <= high;
  const pct = formatNumber(efficiency * 100, 3);
  const message = inside
    ? `Overall pump efficiency ${pct} % is within the usual range.`
    : `Overall pump efficiency ${pct} % is outside the usual ${low * 100}–${high * 100} %; check the pump maker's figure.`;
  return makeCheck(
    "efficiency-range",
    inside ? "ok" : "warn",
    message,
    "Overall efficiency of a hydraulic pump is usually 80–95 %.",
    cite("ETB"),
  );
}

function unloadCheck(unloadBar: number, pressureBar: number, reliefBar: number, fmt: Fmt): Check {
  const head = `Unloading pressure ${fmt("pressure", unloadBar)}`;
  let level: CheckLevel = "ok";
  let message = `Large section unloads at ${fmt("pressure", unloadBar)}, below the working pressure ${fmt("pressure", pressureBar)}.`;
  if (unloadBar >= reliefBar) {
    level = "warn";
    message = `${head} is at or above the relief ${fmt("pressure", reliefBar)}: the large section never unloads, so pressing speed, pressing power and the motor all follow the total flow.`;
  } else if (unloadBar > pressureBar) {
    message = `${head} is above the working pressure ${fmt("pressure", pressureBar)}: the press works at the total flow and unloads only when it stalls towards relief.`;
  }
  return makeCheck(
    "unload-vs-relief",
    level,
    message,
    "Both sections feed the cylinder until the unloading setting; above it only the small section pumps.",
    cite("HP", "CD"),
  );
}

function parallelNote(count: number): Check {
  return makeCheck(
    "parallel-cylinders",
    "ok",
    `${count} cylinders in parallel share the load evenly only when it is centred; an off-centre load tilts the platen, so guide it.`,
    "Cylinders at one pressure add their areas; the split between them follows the load position.",
    COMMON_PRACTICE,
  );
}
