"use client";

import type { ReactNode } from "react";
import { Field } from "@/components/ui/field";
import { DEFAULT_ROD_YIELD_MPA } from "@/lib/hydraulics/buckling";
import { displayUnit, formatQuantity, type UnitSystem } from "@/lib/units";
import { END_FIXITIES, STEEL_GRADES } from "@/lib/validation/sizing";
import type { FormErrors } from "./form-errors";
import { FIELDS, type BlockId, type Choices, type FieldId, type FormState, type SectionMode } from "./form-model";

const SECTION_MODES = ["solid", "built-up"] as const;
/** Fields with a long label or hint take the whole row. */
const WIDE_FIELDS: ReadonlySet<FieldId> = new Set(["rodYieldMpa", "usableL", "throatDepthMm"]);

export type FormAction =
  | { type: "value"; id: FieldId; text: string }
  | { type: "choice"; choice: Partial<Choices> }
  | { type: "block"; id: BlockId; on: boolean };

interface Props {
  form: FormState;
  errors: FormErrors;
  dispatch: (action: FormAction) => void;
}

function unitOf(id: FieldId, system: UnitSystem): string {
  const kind = FIELDS[id].kind;
  if (kind === "count") return "";
  if (kind === "percent") return "%";
  return displayUnit(kind, system).symbol;
}

function Select<T extends string>(props: {
  id: string;
  label: string;
  value: T;
  options: readonly T[];
  labels?: Record<T, string>;
  onChange: (v: T) => void;
  wide?: boolean;
}) {
  return (
    <div className={`flex min-w-0 flex-col gap-1 ${props.wide ? "col-span-2" : ""}`}>
      <label htmlFor={props.id} className="text-sm font-medium text-steel-800">
        {props.label}
      </label>
      <select
        id={props.id}
        value={props.value}
        onChange={(e) => props.onChange(props.options.find((o) => o === e.target.value) ?? props.value)}
        className="min-h-11 w-full min-w-0 rounded-md border border-steel-300 bg-white px-3 text-base text-ink shadow-sm focus:border-oil-500 focus:ring-2 focus:ring-oil-100"
      >
        {props.options.map((o) => (
          <option key={o} value={o}>
            {props.labels?.[o] ?? o}
          </option>
        ))}
      </select>
    </div>
  );
}

function Group({ title, children, note }: { title: string; children: ReactNode; note?: string }) {
  return (
    <fieldset className="rounded-lg bg-white p-4 shadow-sm ring-1 ring-steel-200">
      <legend className="float-left mb-3 w-full text-base font-semibold text-ink">{title}</legend>
      {note ? <p className="clear-both mb-3 text-xs text-steel-600">{note}</p> : null}
      <div className="clear-both grid grid-cols-2 items-end gap-3">{children}</div>
    </fieldset>
  );
}

const BLOCKS: { id: BlockId; title: string; note: string }[] = [
  { id: "lines", title: "Line sizes", note: "Oil velocity in each line against the recommended range." },
  { id: "buckling", title: "Rod buckling", note: "Buckling of the rod (Johnson or Euler, whichever governs) and its direct stress at relief force." },
  { id: "ratings", title: "Component ratings", note: "Each rating against the relief setting; leave a part blank to skip it." },
  { id: "reservoir", title: "Reservoir", note: "Tank size against the pump-flow rule of thumb." },
  { id: "plate", title: "Crosshead", note: "Simply supported, loaded at mid-span: a solid plate or a built-up section." },
  { id: "bolster", title: "Bolster", note: "Simply supported, loaded at mid-span: a solid plate or a built-up section." },
  { id: "columns", title: "Side columns or tie rods", note: "Tension in round columns or rods at relief force (closed frames)." },
  { id: "platen", title: "Platen between the rams", note: "The moving plate: pushed at the rods, held by the work over the die width." },
  { id: "throat", title: "Open (C) frame throat", note: "Tension plus bending in the back of an open frame, and how far the jaws open." },
  { id: "die", title: "A die with its own force limit", note: "The maker's limit or your own calculation: the highest gauge reading that keeps within it." },
];

const SECTION_FIELDS: Record<"plate" | "bolster", Record<SectionMode, FieldId[]>> = {
  plate: { solid: ["plateWidthMm"], "built-up": ["plateModulusMm3", "plateInertiaMm4"] },
  bolster: { solid: ["bolsterWidthMm"], "built-up": ["bolsterModulusMm3", "bolsterInertiaMm4"] },
};

function blockFields(id: BlockId, c: Choices): FieldId[] {
  switch (id) {
    case "lines":
      return ["suctionIdMm", "pressureIdMm", "returnIdMm"];
    case "buckling":
      return ["exposedRodMm", "rodYieldMpa"];
    case "ratings":
      return ["hoseBar", "valveBar", "pumpBar", "cylinderBar", "gaugeBar"];
    case "reservoir":
      return ["volumeL", "usableL"];
    case "plate":
      return ["plateSpanMm", "plateThicknessMm", ...SECTION_FIELDS.plate[c.plateSection]];
    case "bolster":
      return ["bolsterSpanMm", "bolsterThicknessMm", ...SECTION_FIELDS.bolster[c.bolsterSection]];
    case "columns":
      return ["columnsCount", "columnsDiameterMm"];
    case "platen":
      return ["platenRodSpacingMm", "platenDieWidthMm", "platenWidthMm", "platenThicknessMm"];
    case "throat":
      return ["throatDepthMm", "throatHeightMm", "throatSectionDepthMm", "throatThicknessMm"];
    case "die":
      return ["dieMaxForceKn"];
  }
}

const SECTION_LABELS: Record<SectionMode, string> = { solid: "Solid plate (width × thickness)", "built-up": "Built-up section (S and I)" };

/** Every input of the calculator, typed in the display units of the form's system. */
export function SizingForm({ form, errors, dispatch }: Props) {
  const input = (id: FieldId) => {
    const unit = unitOf(id, form.system);
    const error = errors[id];
    return (
      <Field
        key={id}
        name={id}
        id={`sizing-${id}`}
        label={unit ? `${FIELDS[id].label} (${unit})` : FIELDS[id].label}
        inputMode={FIELDS[id].kind === "count" ? "numeric" : "decimal"}
        autoComplete="off"
        // A small intrinsic size lets the input shrink into a half-width column at 360 px.
        size={6}
        className={WIDE_FIELDS.has(id) ? "col-span-2 min-w-0" : "min-w-0"}
        value={form.values[id]}
        onChange={(e) => dispatch({ type: "value", id, text: e.target.value })}
        errors={error ? [error] : undefined}
        hint={id === "rodYieldMpa" ? `Blank: ${formatQuantity("stress", DEFAULT_ROD_YIELD_MPA, form.system)} assumed (low on purpose).` : undefined}
      />
    );
  };
  const choose = (choice: Partial<Choices>) => dispatch({ type: "choice", choice });
  const c = form.choices;

  const extras: Partial<Record<BlockId, ReactNode>> = {
    buckling: (
      <Select wide id="sizing-endFixity" label="Rod end fixity" value={c.endFixity} options={END_FIXITIES} onChange={(endFixity) => choose({ endFixity })} />
    ),
    plate: (
      <>
        <Select wide id="sizing-plateSection" label="Section" value={c.plateSection} options={SECTION_MODES} labels={SECTION_LABELS} onChange={(plateSection) => choose({ plateSection })} />
        <Select id="sizing-plateGrade" label="Steel grade" value={c.plateGrade} options={STEEL_GRADES} onChange={(plateGrade) => choose({ plateGrade })} />
      </>
    ),
    bolster: (
      <>
        <Select wide id="sizing-bolsterSection" label="Section" value={c.bolsterSection} options={SECTION_MODES} labels={SECTION_LABELS} onChange={(bolsterSection) => choose({ bolsterSection })} />
        <Select id="sizing-bolsterGrade" label="Steel grade" value={c.bolsterGrade} options={STEEL_GRADES} onChange={(bolsterGrade) => choose({ bolsterGrade })} />
      </>
    ),
    platen: <Select id="sizing-platenGrade" label="Steel grade" value={c.platenGrade} options={STEEL_GRADES} onChange={(platenGrade) => choose({ platenGrade })} />,
    throat: <Select id="sizing-throatGrade" label="Steel grade" value={c.throatGrade} options={STEEL_GRADES} onChange={(throatGrade) => choose({ throatGrade })} />,
    columns: (
      <Select id="sizing-columnsGrade" label="Steel grade" value={c.columnsGrade} options={STEEL_GRADES} onChange={(columnsGrade) => choose({ columnsGrade })} />
    ),
  };

  return (
    <div className="flex flex-col gap-4">
      <Group title="Cylinders">{(["count", "boreMm", "rodMm", "strokeMm"] as const).map(input)}</Group>
      <Group title="Pump" note="A two-stage (high-low) pump moves fast on both sections until the unloading pressure, then slow on the small one.">
        <Select
          wide
          id="sizing-pumpKind"
          label="Pump type"
          value={c.pumpKind}
          options={["two-stage", "single"] as const}
          labels={{ "two-stage": "Two-stage (high-low)", single: "Single stage" }}
          onChange={(pumpKind) => choose({ pumpKind })}
        />
        {c.pumpKind === "single" ? input("flowLpm") : (["approachFlowLpm", "pressingFlowLpm", "unloadBar"] as const).map(input)}
        {input("efficiencyPct")}
      </Group>
      <Group title="Pressure and motor">{(["pressureBar", "reliefBar", "motorKw", "pressDistanceMm"] as const).map(input)}</Group>
      {BLOCKS.map((block) => (
        <fieldset key={block.id} className="rounded-lg bg-white p-4 shadow-sm ring-1 ring-steel-200">
          <legend className="sr-only">{block.title}</legend>
          <label className="flex min-h-11 cursor-pointer items-center gap-3 text-base font-semibold text-ink">
            <input
              type="checkbox"
              className="h-5 w-5 accent-oil-600"
              checked={form.blocks[block.id]}
              onChange={(e) => dispatch({ type: "block", id: block.id, on: e.target.checked })}
            />
            {block.title}
          </label>
          <p className="text-xs text-steel-600">{block.note}</p>
          {form.blocks[block.id] ? (
            <div className="mt-3 grid grid-cols-2 items-end gap-3">
              {extras[block.id]}
              {blockFields(block.id, c).map(input)}
            </div>
          ) : null}
        </fieldset>
      ))}
    </div>
  );
}
