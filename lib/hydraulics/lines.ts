/**
 * Oil velocity in the lines against the recommended metric ranges [HYT]:
 * suction 0.5–1.5 m/s, pressure 3–10 m/s, return 2–4 m/s. v = Q / A; d = √(4Q / πv).
 */
import { makeCheck, type Fmt } from "./checks";
import { circleAreaMm2 } from "./force";
import { cite } from "./sources";
import { speedMmS, type PumpFlows } from "./speed";
import type { Check, LineName, LineVelocities, LineVelocity, LinesInput } from "./types";

export const LINE_RANGES_MS: Readonly<Record<LineName, readonly [number, number]>> = {
  suction: [0.5, 1.5],
  pressure: [3, 10],
  return: [2, 4],
};

const MM_PER_M = 1000;

export function lineVelocityMS(flowLpm: number, idMm: number): number {
  return speedMmS(flowLpm, circleAreaMm2(idMm)) / MM_PER_M;
}

/** Smallest inside diameter that keeps a flow at or below a velocity. */
export function lineIdForVelocityMm(flowLpm: number, velocityMS: number): number {
  // A = Q / v, from speedMmS: v(mm/s) = Q·10⁶ / (60·A)
  const areaMm2 = (flowLpm * 1e6) / (60 * velocityMS * MM_PER_M);
  return Math.sqrt((4 * areaMm2) / Math.PI);
}

/**
 * Highest flow each line carries. Suction and pressure lines carry the pump's total (approach)
 * flow; on retract the cap end empties into the return line, which then carries the approach
 * flow times cap/annulus — more than the pump delivers.
 */
export function lineFlows(flows: PumpFlows, capMm2: number, annulusMm2: number): Record<LineName, number> {
  return {
    suction: flows.approachLpm,
    pressure: flows.approachLpm,
    return: (flows.approachLpm * capMm2) / annulusMm2,
  };
}

const LINE_IDS: Readonly<Record<LineName, keyof LinesInput>> = {
  suction: "suctionIdMm",
  pressure: "pressureIdMm",
  return: "returnIdMm",
};

export function lineVelocities(lines: LinesInput, flows: Record<LineName, number>): LineVelocities {
  const result: LineVelocities = {};
  for (const name of Object.keys(LINE_IDS) as LineName[]) {
    const idMm = lines[LINE_IDS[name]];
    if (idMm === undefined) continue;
    const flowLpm = flows[name];
    result[name] = { idMm, flowLpm, velocityMS: lineVelocityMS(flowLpm, idMm), rangeMS: LINE_RANGES_MS[name] };
  }
  return result;
}

const TOO_FAST_EFFECT: Record<LineName, string> = {
  suction: "the pump may cavitate",
  pressure: "expect pressure loss, heat and noise",
  return: "expect back-pressure and heat",
};

export function lineChecks(velocities: LineVelocities, fmt: Fmt): Check[] {
  const checks: Check[] = [];
  for (const name of Object.keys(LINE_IDS) as LineName[]) {
    const line = velocities[name];
    if (line) checks.push(lineCheck(name, line, fmt));
  }
  return checks;
}

function lineCheck(name: LineName, line: LineVelocity, fmt: Fmt): Check {
  const [low, high] = line.rangeMS;
  const speed = fmt("fluidVelocity", line.velocityMS);
  const range = fmt.range("fluidVelocity", low, high);
  const head = `${name[0]?.toUpperCase()}${name.slice(1)} line ${fmt("length", line.idMm)} ID at ${fmt("flow", line.flowLpm)}: ${speed}`;
  let level: Check["level"] = "ok";
  let message = `${head}, within ${range}.`;
  if (line.velocityMS > high) {
    level = "warn";
    message = `${head}, above ${range}: ${TOO_FAST_EFFECT[name]}. Use a larger line.`;
  } else if (line.velocityMS < low) {
    message = `${head}, below ${range}: larger than needed, which does no harm.`;
  }
  return makeCheck(
    `line-${name}`,
    level,
    message,
    "Recommended oil velocity: suction 0.5–1.5 m/s, pressure 3–10 m/s, return 2–4 m/s.",
    cite("HYT"),
  );
}
