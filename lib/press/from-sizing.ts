/**
 * The parts a saved sizing implies, so a planned press starts with its components instead of a
 * blank record. Pure. Ratings the sizing did not state are left for the builder to fill in from
 * the parts they actually buy — never guessed.
 */
import { allPlates } from "@/lib/hydraulics";
import type { SizingInput } from "@/lib/hydraulics/types";
import { componentInputSchema, type ComponentInput } from "@/lib/validation/press";

export function componentsFromSizing(input: SizingInput): ComponentInput[] {
  const r = input.ratings ?? {};
  const relief = input.reliefBar ?? input.pressureBar;
  const parts: unknown[] = [];
  for (let n = 1; n <= input.cylinders.count; n++) {
    parts.push({
      kind: "cylinder",
      label: input.cylinders.count > 1 ? `Cylinder ${n}` : "Cylinder",
      spec: {
        boreMm: input.cylinders.boreMm,
        rodMm: input.cylinders.rodMm,
        strokeMm: input.cylinders.strokeMm,
        // A planned cylinder must at least be bought for the relief setting; the real rating replaces this.
        ratedPressureBar: r.cylinderBar ?? relief,
        endFixity: input.buckling?.endFixity ?? "fixed-pinned",
        ...(input.buckling ? { exposedRodMm: input.buckling.exposedRodMm } : {}),
      },
    });
  }
  const pump = input.pump;
  parts.push({
    kind: "pump",
    label: "Pump",
    spec:
      pump.kind === "single"
        ? { pumpKind: "single", flowLpm: pump.flowLpm, ratedPressureBar: r.pumpBar ?? relief }
        : { pumpKind: "two-stage", approachFlowLpm: pump.approachFlowLpm, pressingFlowLpm: pump.pressingFlowLpm, unloadBar: pump.unloadBar, ratedPressureBar: r.pumpBar ?? relief },
  });
  if (input.motorKw) parts.push({ kind: "motor", label: "Motor", spec: { powerKw: input.motorKw, supply: "three-phase" } });
  parts.push({ kind: "relief-valve", label: "Relief valve", spec: { settingBar: relief } });
  if (r.valveBar) parts.push({ kind: "directional-valve", label: "Directional valve", spec: { ratedFlowLpm: pump.kind === "single" ? pump.flowLpm : pump.approachFlowLpm, ratedPressureBar: r.valveBar } });
  const lines = input.lines ?? {};
  if (lines.pressureIdMm && r.hoseBar) {
    parts.push({ kind: "hose", label: "Pressure hose", spec: { line: "pressure", insideDiameterMm: lines.pressureIdMm, standard: "to be chosen", ratedPressureBar: r.hoseBar, lengthMm: 1000 } });
  }
  if (input.reservoir) parts.push({ kind: "reservoir", label: "Reservoir", spec: { volumeL: input.reservoir.volumeL } });
  if (r.gaugeBar) parts.push({ kind: "gauge", label: "Gauge", spec: { rangeBar: r.gaugeBar } });
  // Component records hold solid plates; a built-up section stays in the saved sizing only.
  for (const plate of allPlates(input)) {
    if (plate.widthMm === undefined) continue;
    const { role, spanMm, widthMm, thicknessMm, grade } = plate;
    parts.push({ kind: role, label: role === "crosshead" ? "Crosshead" : "Bolster plate", spec: { spanMm, widthMm, thicknessMm, grade } });
  }
  if (input.platen && input.platen.widthMm !== undefined) {
    const { rodSpacingMm, dieWidthMm, widthMm, thicknessMm, grade } = input.platen;
    parts.push({ kind: "platen", label: "Platen", spec: { rodSpacingMm, dieWidthMm, widthMm, thicknessMm, grade } });
  }
  if (input.throat && input.throat.sectionDepthMm !== undefined) {
    const { depthMm, heightMm, sectionDepthMm, thicknessMm, grade } = input.throat;
    parts.push({ kind: "frame-member", label: "Throat (back)", spec: { role: "throat", throatDepthMm: depthMm, lengthMm: heightMm, widthMm: sectionDepthMm, thicknessMm, grade } });
  }
  for (const die of input.dies ?? []) parts.push({ kind: "die", label: die.name, spec: { purpose: die.name, maxForceKn: die.maxForceKn } });
  if (input.columns) {
    for (let n = 1; n <= input.columns.count; n++) {
      parts.push({ kind: "frame-member", label: `Column ${n}`, spec: { role: "column", diameterMm: input.columns.diameterMm, grade: input.columns.grade } });
    }
  }
  // Everything goes through the same schema as typed input; a part the schema refuses is left out.
  return parts.flatMap((p) => {
    const parsed = componentInputSchema.safeParse({ ...(p as object), purchased: false });
    return parsed.success ? [parsed.data] : [];
  });
}
