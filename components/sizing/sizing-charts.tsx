"use client";

import type { ReactNode } from "react";
import {
  Bar,
  BarChart,
  CartesianGrid,
  Cell,
  LabelList,
  Legend,
  Line,
  LineChart,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from "recharts";
import { cycleSplitS, forceKn } from "@/lib/hydraulics";
import type { SizingInput, SizingResult } from "@/lib/hydraulics/types";
import { displayUnit, formatNumber, toDisplay, type UnitSystem } from "@/lib/units";

interface Props {
  input: SizingInput;
  result: SizingResult;
  system: UnitSystem;
}

const OIL = "#cf8118";
const STEEL = "#354350";
const GREEN = "#2e7a4c";
const POINTS = 20;
const AXIS_TICK = { fontSize: 11, fill: "#465665" };

function Figure({ title, caption, children, short }: { title: string; caption: string; children: ReactNode; short?: boolean }) {
  return (
    <figure className="min-w-0">
      <h3 className="text-sm font-semibold text-ink">{title}</h3>
      <div className={`mt-2 w-full ${short ? "h-32" : "h-56"}`}>{children}</div>
      <figcaption className="mt-1 text-xs text-steel-600">{caption}</figcaption>
    </figure>
  );
}

const fmt = (v: unknown): string => (typeof v === "number" ? formatNumber(v) : String(v));
const TICK_FORMAT = new Intl.NumberFormat("en-US", { maximumSignificantDigits: 4 });
/** Axis ticks: no trailing zeros ("50", not "50.0"). */
const tick = (v: unknown): string => (typeof v === "number" ? TICK_FORMAT.format(v) : String(v));

/** 0 … ≥ max in about `count` steps of 1, 2, 2.5 or 5 × 10ⁿ, so a reader can interpolate. */
function niceTicks(max: number, count = 4): number[] {
  if (!(max > 0)) return [0];
  const raw = max / count;
  const power = 10 ** Math.floor(Math.log10(raw));
  const step = ([1, 2, 2.5, 5, 10].find((m) => m * power >= raw) ?? 10) * power;
  const ticks: number[] = [];
  for (let i = 0; i * step < max + step * 1e-9; i++) ticks.push(i * step);
  if ((ticks[ticks.length - 1] ?? 0) < max) ticks.push(ticks.length * step);
  return ticks;
}

/** Force against gauge pressure, from zero to the relief setting: a straight line, F = p·A. */
function ForceChart({ input, result, system }: Props) {
  const p = displayUnit("pressure", system).symbol;
  const f = displayUnit("force", system).symbol;
  const top = Math.max(result.reliefBar, input.pressureBar);
  const data = Array.from({ length: POINTS + 1 }, (_, i) => {
    const bar = (top * i) / POINTS;
    return { p: toDisplay("pressure", bar, system), force: toDisplay("force", forceKn(bar, result.capAreaMm2), system) };
  });
  const mark = (bar: number): number => toDisplay("pressure", bar, system);
  const xTicks = niceTicks(mark(top));
  const yTicks = niceTicks(toDisplay("force", forceKn(top, result.capAreaMm2), system));
  return (
    <Figure
      title={`Force at the dies (${f}) against gauge pressure (${p})`}
      caption={`Working ${formatNumber(mark(input.pressureBar))} ${p} gives ${formatNumber(toDisplay("force", result.forceKn, system))} ${f}; relief ${formatNumber(mark(result.reliefBar))} ${p} gives ${formatNumber(toDisplay("force", result.reliefForceKn, system))} ${f}.`}
    >
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={data} margin={{ top: 16, right: 16, bottom: 4, left: 0 }}>
          <CartesianGrid stroke="#e6eaee" />
          <XAxis dataKey="p" type="number" domain={[0, xTicks[xTicks.length - 1] ?? "auto"]} ticks={xTicks} tick={AXIS_TICK} tickFormatter={tick} />
          <YAxis type="number" domain={[0, yTicks[yTicks.length - 1] ?? "auto"]} ticks={yTicks} tick={AXIS_TICK} tickFormatter={tick} width={48} />
          <Tooltip formatter={(v) => [`${fmt(v)} ${f}`, "Force"]} labelFormatter={(l) => `${fmt(l)} ${p}`} />
          <ReferenceLine x={mark(input.pressureBar)} stroke={GREEN} strokeDasharray="4 3" label={{ value: "working", fontSize: 10, fill: GREEN, position: "insideBottomRight" }} />
          <ReferenceLine x={mark(result.reliefBar)} stroke="#b3261e" strokeDasharray="4 3" label={{ value: "relief", fontSize: 10, fill: "#b3261e", position: "top" }} />
          <Line type="linear" dataKey="force" stroke={OIL} strokeWidth={2.5} dot={false} isAnimationActive={false} />
        </LineChart>
      </ResponsiveContainer>
    </Figure>
  );
}

function SpeedChart({ result, system }: Props) {
  const unit = displayUnit("speed", system).symbol;
  const data = [
    { stage: "Advance", v: toDisplay("speed", result.advanceSpeedMmS, system), fill: STEEL },
    { stage: "Pressing", v: toDisplay("speed", result.pressingSpeedMmS, system), fill: OIL },
    { stage: "Retract", v: toDisplay("speed", result.retractSpeedMmS, system), fill: GREEN },
  ];
  return (
    <Figure title={`Ram speed of each stage (${unit})`} caption={data.map((d) => `${d.stage} ${formatNumber(d.v)} ${unit}`).join(" · ")}>
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={data} margin={{ top: 18, right: 12, bottom: 4, left: 0 }}>
          <CartesianGrid stroke="#e6eaee" vertical={false} />
          <XAxis dataKey="stage" tick={AXIS_TICK} />
          <YAxis tick={AXIS_TICK} tickFormatter={tick} width={48} />
          <Tooltip formatter={(v) => [`${fmt(v)} ${unit}`, "Speed"]} />
          <Bar dataKey="v" isAnimationActive={false}>
            {data.map((d) => (
              <Cell key={d.stage} fill={d.fill} />
            ))}
            <LabelList dataKey="v" position="top" formatter={fmt} fontSize={11} />
          </Bar>
        </BarChart>
      </ResponsiveContainer>
    </Figure>
  );
}

function CycleChart({ input, result }: Props) {
  if (input.pressDistanceMm === undefined) {
    return <p className="text-sm text-steel-600">Enter the distance pressed per cycle to see how one cycle splits its time.</p>;
  }
  const split = cycleSplitS(input.cylinders.strokeMm, input.pressDistanceMm, {
    advanceMmS: result.advanceSpeedMmS,
    pressingMmS: result.pressingSpeedMmS,
    retractMmS: result.retractSpeedMmS,
  });
  const data = [{ name: "One cycle", advance: split.advanceS, press: split.pressS, retract: split.retractS }];
  const total = split.advanceS + split.pressS + split.retractS;
  return (
    <Figure
      short
      title="Time split of one cycle (s)"
      caption={`Advance ${formatNumber(split.advanceS)} s, press ${formatNumber(split.pressS)} s, retract ${formatNumber(split.retractS)} s: ${formatNumber(total)} s in all (valve shifts and dwell not counted).`}
    >
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={data} layout="vertical" margin={{ top: 8, right: 16, bottom: 4, left: 0 }}>
          <CartesianGrid stroke="#e6eaee" horizontal={false} />
          <XAxis type="number" tick={AXIS_TICK} tickFormatter={tick} unit=" s" />
          <YAxis type="category" dataKey="name" hide />
          <Tooltip formatter={(v, name) => [`${fmt(v)} s`, String(name)]} />
          <Legend wrapperStyle={{ fontSize: 12 }} />
          <Bar dataKey="advance" name="Advance" stackId="t" fill={STEEL} barSize={32} isAnimationActive={false} />
          <Bar dataKey="press" name="Press" stackId="t" fill={OIL} barSize={32} isAnimationActive={false} />
          <Bar dataKey="retract" name="Retract" stackId="t" fill={GREEN} barSize={32} isAnimationActive={false} />
        </BarChart>
      </ResponsiveContainer>
    </Figure>
  );
}

/** The three plots of the sizing page; loaded on demand so the calculator's first load stays small. */
export default function SizingCharts(props: Props) {
  return (
    <div className="grid gap-6 md:grid-cols-2">
      <ForceChart {...props} />
      <SpeedChart {...props} />
      <div className="md:col-span-2">
        <CycleChart {...props} />
      </div>
    </div>
  );
}
