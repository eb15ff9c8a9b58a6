import type { SizingInput, SizingResult } from "@/lib/hydraulics/types";
import { displayUnit, formatNumber, formatQuantity, toDisplay, type UnitSystem } from "@/lib/units";
import { forceInThree } from "./format";

/** Cylinders drawn side by side; more than this are drawn as this many with a "× n" label. */
const MAX_DRAWN = 4;
const LABEL_X = 186;
const LINE = 13;

interface Props {
  input: SizingInput;
  result: SizingResult;
  system: UnitSystem;
}

function Label({ y, lines, to }: { y: number; lines: string[]; to?: [number, number] }) {
  return (
    <g>
      {to ? <path d={`M${LABEL_X - 4} ${y - 4} H${to[0] + 8} L${to[0]} ${to[1]}`} fill="none" stroke="#7d8e9c" strokeWidth="0.8" /> : null}
      <text x={LABEL_X} y={y} fontSize="11" fill="#14212b">
        {lines.map((line, i) => (
          <tspan key={line} x={LABEL_X} dy={i === 0 ? 0 : LINE} fontWeight={i === 0 ? 600 : 400}>
            {line}
          </tspan>
        ))}
      </text>
    </g>
  );
}

export type FrameShape = "h-frame" | "four-post" | "c-frame";

/** The frame the input describes: a throat means an open (C) frame, four or more columns a four-post. */
export function frameShapeOf(input: SizingInput): FrameShape {
  if (input.throat) return "c-frame";
  return (input.columns?.count ?? 0) >= 4 ? "four-post" : "h-frame";
}

const FRAME_NAME: Record<FrameShape, string> = { "h-frame": "H-frame", "four-post": "four-post", "c-frame": "open (C) frame" };

/** The frame's outline; the cylinders, platen and dies are drawn over it. */
function Frame({ shape }: { shape: FrameShape }) {
  if (shape === "c-frame") {
    return (
      <g fill="#e6eaee" stroke="#5c6e7d" strokeWidth="1.5" data-frame="c-frame">
        <path d="M10 14 H170 V38 H40 V236 H170 V262 H10 Z" />
      </g>
    );
  }
  return (
    <g fill="#e6eaee" stroke="#5c6e7d" strokeWidth="1.5" data-frame={shape}>
      <rect x="10" y="14" width="160" height="24" rx="2" />
      {shape === "four-post" ? (
        // the two rear posts, seen between the front ones
        <g fill="#cdd5dc" strokeDasharray="3 2">
          <rect x="40" y="38" width="10" height="198" />
          <rect x="130" y="38" width="10" height="198" />
        </g>
      ) : null}
      <rect x="18" y="38" width="14" height="198" />
      <rect x="148" y="38" width="14" height="198" />
      <rect x="10" y="236" width="160" height="26" rx="2" />
    </g>
  );
}

/** A front view of the press (not to scale) following its frame and cylinder count, labelled with the computed figures. */
export function PressSchematic({ input, result, system }: Props) {
  const q = (kind: Parameters<typeof formatQuantity>[0], value: number): string => formatQuantity(kind, value, system);
  const { count, boreMm, rodMm, strokeMm } = input.cylinders;
  const drawn = Math.min(count, MAX_DRAWN);
  const span = 84;
  const each = span / drawn;
  const bodyW = each - 6;
  const rodW = Math.max(3, (bodyW * rodMm) / boreMm);
  const left = 90 - span / 2;
  const pump = input.pump;
  const flowUnit = displayUnit("flow", system).symbol;
  const flowNumber = (lpm: number): string => formatNumber(toDisplay("flow", lpm, system));
  const flows =
    pump.kind === "single" ? q("flow", pump.flowLpm) : `${flowNumber(pump.approachFlowLpm)} → ${flowNumber(pump.pressingFlowLpm)} ${flowUnit}`;
  const [main, ...others] = forceInThree(result.forceKn, system);
  const shape = frameShapeOf(input);
  const summary = `Press schematic, ${FRAME_NAME[shape]}: ${count} cylinder${count > 1 ? "s" : ""} of ${q("length", boreMm)} bore, force ${main?.text ?? ""} at ${q("pressure", input.pressureBar)}.`;

  return (
    <svg viewBox="0 0 340 330" className="mx-auto h-auto w-full max-w-lg" role="img" aria-label={summary}>
      <title>{summary}</title>
      <Frame shape={shape} />
      {/* cylinders, rods, moving platen and dies */}
      {Array.from({ length: drawn }, (_, i) => {
        const x = left + i * each + 3;
        return (
          <g key={i}>
            <rect x={x} y="38" width={bodyW} height="66" rx="2" fill="#cf8118" stroke="#874f10" />
            <rect x={x + bodyW / 2 - rodW / 2} y="104" width={rodW} height="38" fill="#a9b6c1" stroke="#5c6e7d" />
          </g>
        );
      })}
      {count > MAX_DRAWN ? (
        <text x="90" y="76" fontSize="13" fontWeight="700" textAnchor="middle" fill="#14212b">
          × {count}
        </text>
      ) : null}
      <rect x="40" y="142" width="100" height="14" rx="2" fill="#7d8e9c" stroke="#354350" />
      <rect x="72" y="156" width="36" height="12" fill="#354350" />
      <rect x="72" y="224" width="36" height="12" fill="#354350" />
      {/* ram travel: down (advance, press) and up (retract) */}
      <g strokeWidth="1.6">
        <path d="M124 174 V200" stroke="#2e7a4c" />
        <path d="M120 196 L124 204 L128 196 Z" fill="#2e7a4c" stroke="#2e7a4c" />
        <path d="M54 204 V178" stroke="#465665" />
        <path d="M50 182 L54 174 L58 182 Z" fill="#465665" stroke="#465665" />
      </g>
      {/* pump and motor, feeding the cap end */}
      <path d="M90 278 V262" stroke="#cf8118" strokeWidth="2" />
      <rect x="10" y="278" width="320" height="44" rx="3" fill="#fdf5e8" stroke="#cf8118" />
      <text x="20" y="296" fontSize="11" fill="#14212b">
        <tspan fontWeight="600">Pump</tspan> {flows}
      </text>
      <text x="20" y="312" fontSize="11" fill="#14212b">
        <tspan fontWeight="600">Motor</tspan> {input.motorKw !== undefined ? `${q("power", input.motorKw)}, ` : ""}needs {q("power", result.motorRequiredKw)}
      </text>

      <Label y={24} lines={[`${count} × ${q("length", boreMm)} bore`, `rod ${q("length", rodMm)}`, `stroke ${q("length", strokeMm)}`]} to={[90 + span / 2 - 3, 60]} />
      <Label y={78} lines={[`${q("pressure", input.pressureBar)} working`, `relief ${q("pressure", result.reliefBar)}`]} to={[130, 96]} />
      <Label
        y={116}
        lines={[main?.text ?? "", ...others.map((o) => `= ${o.text}`), `${q("force", result.reliefForceKn)} at relief`]}
        to={[140, 149]}
      />
      <Label
        y={186}
        lines={[
          "Ram speed",
          `▼ ${q("speed", result.advanceSpeedMmS)} advance`,
          `▼ ${q("speed", result.pressingSpeedMmS)} pressing`,
          `▲ ${q("speed", result.retractSpeedMmS)} retract`,
        ]}
        to={[128, 188]}
      />
      <Label
        y={248}
        lines={
          result.cycleTimeS !== undefined
            ? [`${result.cycleTimeS.toFixed(1)} s a cycle`, `retract force ${q("force", result.retractForceKn)}`]
            : ["Retract force", q("force", result.retractForceKn)]
        }
      />
    </svg>
  );
}
