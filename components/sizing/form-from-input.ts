/**
 * Rebuilds the calculator's form from a saved or linked SI input (e.g. after signing in to save,
 * or reopening a planned press): each field present takes its value, each optional field absent
 * is left blank, and each block is switched on only when the input has it.
 */
import type { SizingInput } from "@/lib/hydraulics/types";
import type { UnitSystem } from "@/lib/units";
import { defaultForm, FIELD_IDS, FIELDS, toText, type BlockId, type FieldId, type FormState } from "./form-model";

function at(input: SizingInput, path: string): unknown {
  let value: unknown = input;
  for (const key of path.split(".")) value = typeof value === "object" && value !== null ? (value as Record<string, unknown>)[key] : undefined;
  return value;
}

const BLOCKS: readonly BlockId[] = ["lines", "buckling", "ratings", "reservoir", "plate", "columns"];
/** Fields of the pump kind not in use keep their defaults, ready if the user switches kind. */
const PUMP_FIELDS: Record<"single" | "two-stage", readonly FieldId[]> = {
  single: ["flowLpm"],
  "two-stage": ["approachFlowLpm", "pressingFlowLpm", "unloadBar"],
};

export function formFromInput(input: SizingInput, system: UnitSystem): FormState {
  const form = defaultForm(system);
  const blocks = { ...form.blocks };
  // The form only draws solid plates; a built-up section stays out rather than being misread.
  for (const block of BLOCKS) blocks[block] = input[block] !== undefined && !(block === "plate" && input.plate?.widthMm === undefined);
  const unusedPump = PUMP_FIELDS[input.pump.kind === "single" ? "two-stage" : "single"];

  const values = { ...form.values };
  for (const id of FIELD_IDS) {
    const [head] = FIELDS[id].path.split(".");
    if (unusedPump.includes(id)) continue;
    if (BLOCKS.includes(head as BlockId) && !blocks[head as BlockId]) continue;
    const value = at(input, FIELDS[id].path);
    values[id] = typeof value === "number" ? toText(FIELDS[id], value, system) : "";
  }
  return {
    system,
    pristine: false,
    values,
    blocks,
    choices: {
      pumpKind: input.pump.kind,
      endFixity: input.buckling?.endFixity ?? form.choices.endFixity,
      plateRole: input.plate?.role ?? form.choices.plateRole,
      plateGrade: input.plate?.grade ?? form.choices.plateGrade,
      columnsGrade: input.columns?.grade ?? form.choices.columnsGrade,
    },
  };
}
