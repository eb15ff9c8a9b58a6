/**
 * Rebuilds the calculator's form from a saved or linked SI input (e.g. after signing in to save,
 * or reopening a planned press): each field present takes its value, each optional field absent
 * is left blank, and each block is switched on only when the input has it. The crosshead fills
 * the crosshead block and the bolster the bolster block, whether they came as `plate` or `plates`.
 */
import { allPlates } from "@/lib/hydraulics";
import type { PlateInput, SizingInput } from "@/lib/hydraulics/types";
import type { UnitSystem } from "@/lib/units";
import { defaultForm, FIELD_IDS, FIELDS, toText, type BlockId, type FieldId, type FormState, type SectionMode } from "./form-model";

function at(input: unknown, path: string): unknown {
  let value: unknown = input;
  for (const key of path.split(".")) value = typeof value === "object" && value !== null ? (value as Record<string, unknown>)[key] : undefined;
  return value;
}

/** Fields of the pump kind not in use keep their defaults, ready if the user switches kind. */
const PUMP_FIELDS: Record<"single" | "two-stage", readonly FieldId[]> = {
  single: ["flowLpm"],
  "two-stage": ["approachFlowLpm", "pressingFlowLpm", "unloadBar"],
};

const sectionOf = (plate: PlateInput | undefined): SectionMode => (plate && plate.widthMm === undefined ? "built-up" : "solid");

export function formFromInput(input: SizingInput, system: UnitSystem): FormState {
  const form = defaultForm(system);
  const plates = allPlates(input);
  const crosshead = plates.find((p) => p.role === "crosshead");
  const bolster = plates.find((p) => p.role === "bolster");
  // The form's own layout: the crosshead sits under `plate`, the bolster under `plates[0]`.
  const laidOut = { ...input, plate: crosshead, plates: bolster ? [bolster] : undefined };
  const present: Record<BlockId, boolean> = {
    lines: input.lines !== undefined,
    buckling: input.buckling !== undefined,
    ratings: input.ratings !== undefined,
    reservoir: input.reservoir !== undefined,
    plate: crosshead !== undefined,
    bolster: bolster !== undefined,
    columns: input.columns !== undefined,
    platen: input.platen !== undefined,
    throat: input.throat !== undefined,
    die: (input.dies ?? []).length > 0,
  };
  const blockOf = (id: FieldId): BlockId | undefined => {
    const path = FIELDS[id].path;
    if (path.startsWith("plates.")) return "bolster";
    if (path.startsWith("dies.")) return "die";
    const head = path.split(".")[0] as BlockId;
    return head in present ? head : undefined;
  };
  const unusedPump = PUMP_FIELDS[input.pump.kind === "single" ? "two-stage" : "single"];

  const values = { ...form.values };
  for (const id of FIELD_IDS) {
    if (unusedPump.includes(id)) continue;
    const block = blockOf(id);
    if (block && !present[block]) continue;
    const value = at(laidOut, FIELDS[id].path);
    values[id] = typeof value === "number" ? toText(FIELDS[id], value, system) : "";
  }
  const c = form.choices;
  return {
    system,
    pristine: false,
    values,
    blocks: present,
    choices: {
      pumpKind: input.pump.kind,
      endFixity: input.buckling?.endFixity ?? c.endFixity,
      plateGrade: crosshead?.grade ?? c.plateGrade,
      plateSection: sectionOf(crosshead),
      bolsterGrade: bolster?.grade ?? c.bolsterGrade,
      bolsterSection: sectionOf(bolster),
      columnsGrade: input.columns?.grade ?? c.columnsGrade,
      platenGrade: input.platen?.grade ?? c.platenGrade,
      throatGrade: input.throat?.grade ?? c.throatGrade,
    },
  };
}
