/**
 * Gauge card: gauge reading → force at the dies, every 10 bar (metric) or 100 psi (imperial) up to
 * the relief setting, plus a last row at relief itself. Gauge pressure drives the force directly;
 * atmospheric pressure is never added. tons = psi · A(in²) / 2000 (short tons).
 */
import { convert, type UnitSystem } from "@/lib/units";
import { circleAreaMm2, forceInTons, forceKn } from "./force";

export interface GaugeRow {
  gaugeBar: number;
  gaugePsi: number;
  forceKn: number;
  forceTonnesForce: number;
  forceShortTons: number;
}

export interface GaugeTableInput {
  cylinders: { count: number; boreMm: number };
  reliefBar: number;
  system: UnitSystem;
  /** Step between rows in the system's pressure unit; default 10 bar or 100 psi. */
  step?: number;
}

const DEFAULT_STEP: Record<UnitSystem, number> = { metric: 10, imperial: 100 };
/** A card longer than this is no longer a card; a larger step is needed. */
export const GAUGE_TABLE_MAX_ROWS = 500;
// A relief of 199.9999999 bar after unit round trips still prints its 200 bar row.
const EDGE_TOLERANCE = 1e-9;

export function gaugeTable(input: GaugeTableInput): GaugeRow[] {
  const step = input.step ?? DEFAULT_STEP[input.system];
  const unit = input.system === "metric" ? "bar" : "psi";
  const reliefInUnit = convert("pressure", input.reliefBar, "bar", unit);
  if (!(step > 0) || !(reliefInUnit > 0)) throw new RangeError("Gauge table needs a positive step and relief");
  const steps = Math.floor(reliefInUnit / step + EDGE_TOLERANCE);
  if (steps > GAUGE_TABLE_MAX_ROWS) throw new RangeError(`Gauge table would have ${steps} rows; use a larger step`);

  const capMm2 = input.cylinders.count * circleAreaMm2(input.cylinders.boreMm);
  const readings: number[] = [];
  for (let i = 1; i <= steps; i++) readings.push(i * step); // multiply, never accumulate rounding
  if (reliefInUnit - steps * step > step * EDGE_TOLERANCE) readings.push(reliefInUnit);

  return readings.map((reading) => {
    const gaugeBar = convert("pressure", reading, unit, "bar");
    const tons = forceInTons(forceKn(gaugeBar, capMm2));
    return {
      gaugeBar,
      gaugePsi: convert("pressure", reading, unit, "psi"),
      forceKn: tons.kN,
      forceTonnesForce: tons.tonnesForce,
      forceShortTons: tons.shortTons,
    };
  });
}
