import { circleAreaMm2, forceKn, gaugeTable, pressureForForceBar, type DieLimitInput, type GaugeRow } from "@/lib/hydraulics";
import { displayUnit, formatNumber, toDisplay, type QuantityKind, type UnitSystem } from "@/lib/units";

export interface GaugeCardProps {
  name: string;
  cylinders: { count: number; boreMm: number };
  reliefBar: number;
  system: UnitSystem;
  /** Dies with their own force limit: each gets its highest safe gauge reading on the card. */
  dies?: readonly DieLimitInput[];
}

// Steps in the system's pressure unit; the first that keeps the card on one page is used.
const STEPS: Record<UnitSystem, readonly number[]> = {
  metric: [10, 20, 25, 50, 100, 200],
  imperial: [100, 200, 250, 500, 1000, 2000, 5000],
};
const MAX_ROWS = 60;
/**
 * One page on A4 and on Letter: margins that fit the smaller sheet in each direction, and no
 * screen-height minimum pushing a second, empty page. Rendered with the card, so every page
 * that shows one prints it the same way.
 */
export const GAUGE_CARD_PRINT_CSS =
  "@page { size: auto; margin: 12mm; } @media print { html, body { min-height: 0 !important; } main { padding: 0 !important; } }";
/** Above this many rows the table is set in two columns to stay on one page. */
const ONE_COLUMN_ROWS = 25;

function rowsFor(props: GaugeCardProps): { rows: GaugeRow[]; step: number } {
  const steps = STEPS[props.system];
  for (const step of steps) {
    const rows = gaugeTable({ cylinders: props.cylinders, reliefBar: props.reliefBar, system: props.system, step });
    if (rows.length <= MAX_ROWS) return { rows, step };
  }
  const step = steps[steps.length - 1] ?? 100;
  return { rows: gaugeTable({ ...props, step }), step };
}

const PLAIN = new Intl.NumberFormat("en-US", { maximumSignificantDigits: 4 });

/** "125 mm", "4 in", "210 bar": up to 4 significant digits, no padding zeros. */
function plain(kind: QuantityKind, base: number, system: UnitSystem): string {
  return `${PLAIN.format(toDisplay(kind, base, system))} ${displayUnit(kind, system).symbol}`;
}

/** A gauge reading as printed on the dial: whole steps without decimals, the relief row to 0.1. */
function reading(value: number): string {
  const tenth = Math.round(value * 10) / 10;
  return Number.isInteger(tenth) ? formatNumber(tenth, 1) : formatNumber(tenth, 4);
}

function Table({ rows, system, label }: { rows: GaugeRow[]; system: UnitSystem; label: string }) {
  const unit = system === "metric" ? "bar" : "psi";
  return (
    <table className="w-full border-collapse text-right font-mono text-sm tabular-nums print:text-[11pt]" aria-label={label}>
      <thead>
        <tr className="border-b-2 border-ink font-sans text-xs tracking-wide text-steel-700">
          <th scope="col" className="py-1 pr-2 text-left">Gauge ({unit})</th>
          <th scope="col" className="px-2 py-1">kN</th>
          <th scope="col" className="px-2 py-1">t(f)</th>
          <th scope="col" className="py-1 pl-2">US tons</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((row) => (
          <tr key={row.gaugeBar} className="border-b border-steel-200 even:bg-steel-50 print:even:bg-transparent">
            <th scope="row" className="py-0.5 pr-2 text-left font-semibold">
              {reading(system === "metric" ? row.gaugeBar : row.gaugePsi)}
            </th>
            <td className="px-2 py-0.5">{formatNumber(row.forceKn, 3)}</td>
            <td className="px-2 py-0.5">{formatNumber(row.forceTonnesForce, 3)}</td>
            <td className="py-0.5 pl-2">{formatNumber(row.forceShortTons, 3)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/**
 * Gauge reading → force at the dies for one press, to print and hang beside the gauge. Used by
 * the sizing page's gauge card and, for a saved press, by its record.
 */
export function GaugeCard(props: GaugeCardProps) {
  const { rows, step } = rowsFor(props);
  const { system, cylinders } = props;
  const half = Math.ceil(rows.length / 2);
  const split = rows.length > ONE_COLUMN_ROWS ? [rows.slice(0, half), rows.slice(half)] : [rows];
  const unit = system === "metric" ? "bar" : "psi";
  const bore = plain("length", cylinders.boreMm, system);
  return (
    <article className="gauge-card mx-auto max-w-3xl rounded-lg bg-white p-5 shadow-sm ring-1 ring-steel-200 print:max-w-none print:rounded-none print:p-0 print:shadow-none print:ring-0">
      <style>{GAUGE_CARD_PRINT_CSS}</style>
      <header className="mb-3 border-b-2 border-ink pb-2">
        <p className="text-xs font-semibold uppercase tracking-widest text-steel-600">Gauge card · force at the dies</p>
        <h1 className="text-2xl font-semibold text-ink">{props.name || "Unnamed press"}</h1>
        <p className="mt-1 text-sm text-steel-700">
          {cylinders.count} × {bore} bore · relief set at {plain("pressure", props.reliefBar, system)} · every{" "}
          {PLAIN.format(step)} {unit}
        </p>
      </header>
      <div className={split.length > 1 ? "grid gap-x-6 sm:grid-cols-2 print:grid-cols-2" : ""}>
        {split.map((part, i) => (
          <Table key={i} rows={part} system={system} label={split.length > 1 ? `Gauge readings, part ${i + 1}` : "Gauge readings"} />
        ))}
      </div>
      <DieLimits {...props} />
      <p className="mt-3 rounded bg-warn-soft p-2 text-sm font-semibold text-ink print:border print:border-ink print:bg-transparent">
        Caution: a force, not a promise. Never exceed the relief setting or the lowest component rating; keep hands out
        of the dies; never feel for a leak — oil under pressure injects through skin.
      </p>
      <p className="mt-2 text-xs text-steel-600">
        Force = gauge pressure × total bore area of {cylinders.count === 1 ? "the cylinder" : `${cylinders.count} cylinders`}{" "}
        (gauge pressure; atmospheric is never added). Seal friction makes the real force a little lower (common practice). t(f) =
        tonne-force (1000 kgf); US ton = 2000 lbf.
      </p>
    </article>
  );
}

/**
 * For each die with its own limit, the highest gauge reading that keeps the force within it:
 * p = F_max / total bore area. A die the press cannot overload at relief says so.
 */
function DieLimits({ dies, cylinders, reliefBar, system }: GaugeCardProps) {
  if (!dies || dies.length === 0) return null;
  const capMm2 = cylinders.count * circleAreaMm2(cylinders.boreMm);
  const reliefKn = forceKn(reliefBar, capMm2);
  return (
    <ul className="mt-3 flex flex-col gap-1 rounded border-2 border-ink p-2 text-sm" aria-label="Die limits" data-testid="die-limits">
      {dies.map((die) => {
        const maxBar = pressureForForceBar(die.maxForceKn, capMm2);
        const limit = plain("force", die.maxForceKn, system);
        return (
          <li key={die.name} data-die={die.name}>
            {die.maxForceKn < reliefKn ? (
              <>
                <strong>With the {die.name}: never above {plain("pressure", maxBar, system)}</strong> on the gauge (die limit {limit}).
              </>
            ) : (
              <>
                {die.name}: limit {limit}, above the press&apos;s force at relief — the relief protects it.
              </>
            )}
          </li>
        );
      })}
    </ul>
  );
}
