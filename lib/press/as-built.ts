/**
 * The as-built check: turns a press's installed components into a sizing input and runs the same
 * engine as the sizing page. Pure — the data layer loads the parts, the page shows the result.
 */
import { evaluateSizing, SizingInputError } from "@/lib/hydraulics";
import { makeCheck, overallLevel } from "@/lib/hydraulics/checks";
import { COMMON_PRACTICE } from "@/lib/hydraulics/sources";
import type { Check, MissingCheck, OverallLevel, SizingInput, SizingResult, ThroatInput } from "@/lib/hydraulics/types";
import type { UnitSystem } from "@/lib/units";
import type { ComponentSpec, SpecOf } from "@/lib/validation/component-spec";

export type InstalledPart = { id: string; label: string; spec: ComponentSpec };
export type PressFigures = { workingPressureBar: number | null; reliefPressureBar: number | null };

export type AsBuilt =
  | {
      ready: true;
      input: SizingInput;
      result: SizingResult;
      checks: Check[];
      /** The engine's verdict over these checks: never "ok" while `missingChecks` lists anything. */
      overall: OverallLevel;
      missingChecks: MissingCheck[];
    }
  | { ready: false; missing: string[]; checks: Check[] };

const of = <K extends ComponentSpec["kind"]>(parts: InstalledPart[], kind: K): (InstalledPart & { spec: SpecOf<K> })[] =>
  parts.filter((p): p is InstalledPart & { spec: SpecOf<K> } => p.spec.kind === kind);

const lowest = <T extends InstalledPart>(parts: T[], value: (p: T) => number | undefined): { part: T; value: number } | undefined =>
  parts
    .map((part) => ({ part, value: value(part) }))
    .filter((x): x is { part: T; value: number } => x.value !== undefined)
    .sort((a, b) => a.value - b.value)[0];

export function evaluateAsBuilt(press: PressFigures, parts: InstalledPart[], system: UnitSystem): AsBuilt {
  const cylinders = of(parts, "cylinder");
  const pump = of(parts, "pump")[0];
  const relief = of(parts, "relief-valve")[0];
  const extra: Check[] = [];
  const missing = [cylinders.length === 0 ? "a cylinder" : null, pump ? null : "a pump"].filter((m): m is string => m !== null);
  const reliefBar = relief?.spec.settingBar ?? press.reliefPressureBar ?? undefined;
  if (!relief) {
    extra.push(
      makeCheck("relief-valve-present", "fail", "No relief valve is recorded: nothing limits the pressure this pump can make.", "Every hydraulic circuit needs over-pressure protection.", `ISO 4413 (over-pressure protection); ${COMMON_PRACTICE}`),
    );
  } else if (relief.spec.ratedPressureBar !== undefined && relief.spec.settingBar > relief.spec.ratedPressureBar) {
    extra.push(makeCheck("relief-valve-rating", "fail", `${relief.label} is set above its own rating.`, "A relief valve must be set within its rated range.", COMMON_PRACTICE));
  }
  if (reliefBar === undefined) missing.push("a relief setting");
  if (cylinders.length > 8) missing.push("at most 8 cylinders");
  if (missing.length > 0 || !pump || reliefBar === undefined) return { ready: false, missing, checks: extra };

  const first = cylinders[0]!.spec;
  if (cylinders.some((c) => c.spec.boreMm !== first.boreMm || c.spec.rodMm !== first.rodMm || c.spec.strokeMm !== first.strokeMm)) {
    extra.push(makeCheck("cylinders-differ", "warn", "The cylinders are not all the same size; figures use the first one for all.", "Parallel cylinders should be identical so they share the load.", COMMON_PRACTICE));
  }
  const input = sizingInputFrom(press, parts, { reliefBar, cylinderCount: cylinders.length });
  try {
    const result = evaluateSizing(input, { system });
    const checks = [...extra, ...nameTheWeakest(result.checks, parts)];
    return { ready: true, input, result, checks, overall: overallLevel(checks, result.missing), missingChecks: result.missing };
  } catch (error) {
    if (error instanceof SizingInputError) {
      return { ready: false, missing: error.problems.map((p) => `${p.path}: ${p.message}`), checks: extra };
    }
    throw error;
  }
}

function sizingInputFrom(press: PressFigures, parts: InstalledPart[], ctx: { reliefBar: number; cylinderCount: number }): SizingInput {
  const cylinder = of(parts, "cylinder")[0]!.spec;
  const pump = of(parts, "pump")[0]!.spec;
  const hoses = of(parts, "hose");
  const hoseId = (line: "pressure" | "return" | "suction") => lowest(hoses.filter((h) => h.spec.line === line), (h) => h.spec.insideDiameterMm)?.value;
  const motor = of(parts, "motor")[0];
  const reservoir = of(parts, "reservoir")[0];
  const plates = [of(parts, "crosshead")[0], of(parts, "bolster")[0]].flatMap((p) =>
    p ? [{ role: p.spec.kind, spanMm: p.spec.spanMm, widthMm: p.spec.widthMm, thicknessMm: p.spec.thicknessMm, grade: p.spec.grade }] : [],
  );
  const columns = of(parts, "frame-member").filter((m) => (m.spec.role === "column" || m.spec.role === "tie-rod") && m.spec.diameterMm);
  const platen = of(parts, "platen")[0]?.spec;
  const throat = throatOf(parts);
  const dies = of(parts, "die").flatMap((d) => (d.spec.maxForceKn !== undefined ? [{ name: d.label, maxForceKn: d.spec.maxForceKn }] : []));
  const lines = { pressureIdMm: hoseId("pressure"), returnIdMm: hoseId("return"), suctionIdMm: hoseId("suction") };
  const ratings = {
    hoseBar: lowest(pressureHoses(parts), (h) => h.spec.ratedPressureBar)?.value,
    valveBar: lowest(of(parts, "directional-valve"), (v) => v.spec.ratedPressureBar)?.value,
    pumpBar: pump.ratedPressureBar,
    cylinderBar: lowest(of(parts, "cylinder"), (c) => c.spec.ratedPressureBar)?.value,
    gaugeBar: lowest(of(parts, "gauge"), (g) => g.spec.rangeBar)?.value,
  };
  return {
    cylinders: { count: ctx.cylinderCount, boreMm: cylinder.boreMm, rodMm: cylinder.rodMm, strokeMm: cylinder.strokeMm },
    pump:
      pump.pumpKind === "single"
        ? { kind: "single", flowLpm: pump.flowLpm }
        : { kind: "two-stage", approachFlowLpm: pump.approachFlowLpm, pressingFlowLpm: pump.pressingFlowLpm, unloadBar: pump.unloadBar },
    pressureBar: Math.min(press.workingPressureBar ?? ctx.reliefBar, ctx.reliefBar),
    reliefBar: ctx.reliefBar,
    ...(motor ? { motorKw: motor.spec.powerKw } : {}),
    ...(Object.values(lines).some((v) => v !== undefined) ? { lines: dropUndefined(lines) } : {}),
    ...(cylinder.exposedRodMm !== undefined ? { buckling: { endFixity: cylinder.endFixity, exposedRodMm: cylinder.exposedRodMm } } : {}),
    ratings: dropUndefined(ratings),
    ...(reservoir ? { reservoir: { volumeL: reservoir.spec.volumeL } } : {}),
    ...(plates.length > 0 ? { plates } : {}),
    ...(columns.length > 0 ? { columns: { count: columns.length, diameterMm: Math.min(...columns.map((c) => c.spec.diameterMm!)), grade: columns[0]!.spec.grade } } : {}),
    ...(platen ? { platen: { rodSpacingMm: platen.rodSpacingMm, dieWidthMm: platen.dieWidthMm, widthMm: platen.widthMm, thicknessMm: platen.thicknessMm, grade: platen.grade } } : {}),
    ...(throat ? { throat } : {}),
    ...(dies.length > 0 ? { dies } : {}),
  };
}

/** An open frame's throat, from a frame member with the role "throat" and all four figures. */
function throatOf(parts: InstalledPart[]): ThroatInput | undefined {
  for (const m of of(parts, "frame-member")) {
    const { role, throatDepthMm, lengthMm, widthMm, thicknessMm, grade } = m.spec;
    if (role === "throat" && throatDepthMm && lengthMm && widthMm && thicknessMm) {
      return { depthMm: throatDepthMm, heightMm: lengthMm, sectionDepthMm: widthMm, thicknessMm, grade };
    }
  }
  return undefined;
}

/**
 * Hoses that can see pump pressure (pump to valve, valve to cylinder ports) are rated against the
 * relief setting; return-to-tank and suction hoses run near atmospheric pressure (common practice).
 */
function pressureHoses(parts: InstalledPart[]) {
  return of(parts, "hose").filter((h) => h.spec.line === "pressure");
}

/** Adds which part is the weakest to each rating check, so a failing check points at a real hose or valve. */
function nameTheWeakest(checks: Check[], parts: InstalledPart[]): Check[] {
  const weakest: Record<string, InstalledPart | undefined> = {
    "rating-hose": lowest(pressureHoses(parts), (h) => h.spec.ratedPressureBar)?.part,
    "rating-valve": lowest(of(parts, "directional-valve"), (v) => v.spec.ratedPressureBar)?.part,
    "rating-cylinder": lowest(of(parts, "cylinder"), (c) => c.spec.ratedPressureBar)?.part,
    "rating-pump": of(parts, "pump")[0],
    "rating-gauge": lowest(of(parts, "gauge"), (g) => g.spec.rangeBar)?.part,
    "rod-side-intensification": lowest(of(parts, "cylinder"), (c) => c.spec.ratedPressureBar)?.part,
  };
  return checks.map((c) => {
    const part = weakest[c.id];
    return part && c.level !== "ok" ? { ...c, message: `${part.label}: ${c.message}` } : c;
  });
}

function dropUndefined<T extends Record<string, number | undefined>>(o: T): { [K in keyof T]?: number } {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as { [K in keyof T]?: number };
}
