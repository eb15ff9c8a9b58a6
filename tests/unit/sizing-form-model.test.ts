import { describe, expect, it } from "vitest";
import { checkForm } from "@/components/sizing/form-errors";
import { formFromInput } from "@/components/sizing/form-from-input";
import { applySi, convertForm, defaultForm, FIELD_IDS, FIELDS, fromText, rawInput } from "@/components/sizing/form-model";
import { evaluateSizing, type SizingInput } from "@/lib/hydraulics";
import { findInputProblems } from "@/lib/hydraulics/validate";
import { FULL_SIZING_INPUT } from "../fixtures/sizing-inputs";

describe("calculator form model", () => {
  it("the default form is a valid ~25 t(f) press with every check passing", () => {
    const check = checkForm(defaultForm("metric"));
    if (!check.ok) throw new Error(JSON.stringify(check.errors));
    expect(findInputProblems(check.input)).toEqual([]);
    const result = evaluateSizing(check.input);
    // computed from formula: 200 bar on a 125 mm bore = 245.4 kN = 25.03 t(f)
    expect(result.forceTonnesForce).toBeCloseTo(25.03, 2);
    // Every check that ran passes; the frame is not all filled in, so the design is incomplete
    expect(result.checks.filter((c) => c.level === "fail")).toEqual([]);
    expect(result.overall).toBe("incomplete");
  });

  it("the imperial defaults are their own round-figure press, also passing every check", () => {
    const form = defaultForm("imperial");
    expect(form.values.boreMm).toBe("5");
    const check = checkForm(form);
    if (!check.ok) throw new Error(JSON.stringify(check.errors));
    const result = evaluateSizing(check.input);
    // computed from formula: 2700 psi on a 5 in bore = 53,014 lbf = 26.5 short tons
    expect(result.forceShortTons).toBeCloseTo(26.507, 2);
    expect(result.checks.filter((c) => c.level === "fail")).toEqual([]);
    expect(result.overall).toBe("incomplete");
  });

  it("every field maps to a distinct schema path", () => {
    const paths = FIELD_IDS.map((id) => FIELDS[id].path);
    expect(new Set(paths).size).toBe(paths.length);
  });

  it("4 in and 2500 psi typed in imperial become exact SI and survive a switch to metric", () => {
    let form = defaultForm("imperial");
    form = { ...form, values: { ...form.values, boreMm: "4", pressureBar: "2500", reliefBar: "2500" } };
    const before = checkForm(form);
    if (!before.ok) throw new Error(JSON.stringify(before.errors));
    expect(before.input.cylinders.boreMm).toBe(101.6); // inch = 25.4 mm exactly
    // psi = 6894.757293168 Pa [reference §11], so 2500 psi = 172.3689 bar (computed from formula)
    expect(before.input.pressureBar).toBeCloseTo(172.36893, 4);

    const metric = convertForm(form, "metric");
    expect(metric.values.boreMm).toBe("101.6");
    expect(metric.values.pressureBar).toBe("172.369");
    const after = checkForm(metric);
    if (!after.ok) throw new Error(JSON.stringify(after.errors));
    // Same force to the displayed precision: 31,416 lbf = 139.75 kN (reference §1, b)
    expect(evaluateSizing(after.input).forceKn).toBeCloseTo(139.75, 2);
    expect(evaluateSizing(before.input).forceKn).toBeCloseTo(139.75, 2);
  });

  it("switching back and forth returns the text the user typed", () => {
    const metric = defaultForm("metric");
    const imperial = convertForm(metric, "imperial");
    expect(imperial.values.strokeMm).toBe("9.84252"); // 250 mm / 25.4
    expect(convertForm(imperial, "metric").values).toEqual(metric.values);
  });

  it("a field edited between switches is converted, the others restored", () => {
    const imperial = convertForm(defaultForm("metric"), "imperial");
    const edited = { ...imperial, values: { ...imperial.values, strokeMm: "12" } };
    const back = convertForm(edited, "metric");
    expect(back.values.strokeMm).toBe("304.8");
    expect(back.values.boreMm).toBe("125");
    for (const id of FIELD_IDS) {
      const si = fromText(FIELDS[id], back.values[id], "metric");
      const before = fromText(FIELDS[id], edited.values[id], "imperial");
      if (before === undefined) expect(si).toBeUndefined();
      // restored text is exact; converted text carries 6 significant digits (mm⁴ values run to 10⁸)
      else expect(Math.abs((si ?? Number.NaN) / before - 1), id).toBeLessThan(1e-5);
    }
  });

  it("keeps text that is not a number as typed across a switch, and reports it", () => {
    const form = { ...defaultForm("metric"), values: { ...defaultForm("metric").values, boreMm: "12x" } };
    const imperial = convertForm(form, "imperial");
    expect(imperial.values.boreMm).toBe("12x");
    const check = checkForm(imperial);
    expect(check.ok).toBe(false);
    expect(check.errors.boreMm).toBe("Enter a number.");
  });

  it("words limits in the display units", () => {
    const base = defaultForm("imperial");
    const check = checkForm({ ...base, values: { ...base.values, pressureBar: "40000" } });
    // 2000 bar = 29,008 psi (computed from formula)
    expect(check.errors.pressureBar).toBe("Enter at most 29,008 psi.");
    const blank = checkForm({ ...base, values: { ...base.values, strokeMm: "" } });
    expect(blank.errors.strokeMm).toBe("Required.");
    const pct = checkForm({ ...base, values: { ...base.values, efficiencyPct: "150" } });
    expect(pct.errors.efficiencyPct).toBe("Enter at most 100 %.");
  });

  it("leaves unchecked blocks out and blank optional fields undefined", () => {
    const form = defaultForm("metric");
    const raw = rawInput({ ...form, blocks: { ...form.blocks, lines: false }, values: { ...form.values, motorKw: "" } });
    expect(raw.lines).toBeUndefined();
    expect(raw.motorKw).toBeUndefined();
    expect(raw.plate).toBeDefined();
  });

  it("sends the die block as one die with its limit, and the tank's usable volume when typed", () => {
    const form = defaultForm("metric");
    const raw = rawInput({ ...form, blocks: { ...form.blocks, die: true }, values: { ...form.values, usableL: "40" } });
    expect(raw.dies).toEqual([{ name: "Your die", maxForceKn: 200 }]);
    expect(raw.reservoir).toEqual({ volumeL: 150, usableL: 40 });
  });

  it("applies SI values picked elsewhere in the form's units", () => {
    const form = applySi(defaultForm("imperial"), { boreMm: 127, pressureBar: 200 });
    expect(form.values.boreMm).toBe("5");
    expect(form.values.pressureBar).toBe("2900.75");
  });
});

describe("reopening a form from a saved input", () => {
  // The shared full design, varied so every select and default is exercised on the way back.
  const FULL: SizingInput = {
    ...FULL_SIZING_INPUT,
    overallEfficiency: 0.87,
    buckling: { endFixity: "fixed-fixed", exposedRodMm: 120, rodYieldMpa: 355 },
    // The form's layout: crosshead as `plate` (solid), bolster as `plates[0]` (built-up)
    plate: { role: "crosshead", spanMm: 350, widthMm: 200, thicknessMm: 60, grade: "A36" },
    plates: [FULL_SIZING_INPUT.plates![1]!],
    columns: { count: 4, diameterMm: 40, grade: "S235JR" },
    platen: { rodSpacingMm: 300, dieWidthMm: 100, widthMm: 250, thicknessMm: 60, grade: "S235JR" },
  };

  it.each(["metric", "imperial"] as const)("gives back the same SI input (%s)", (system) => {
    const check = checkForm(formFromInput(FULL, system));
    if (!check.ok) throw new Error(JSON.stringify(check.errors));
    const back = check.input;
    expect(back.pump.kind).toBe("two-stage");
    expect(back.buckling?.endFixity).toBe("fixed-fixed");
    expect(back.plate).toMatchObject({ role: "crosshead", grade: "A36" });
    expect(back.plates?.[0]).toMatchObject({ role: "bolster", sectionModulusMm3: expect.any(Number) });
    expect(back.platen?.grade).toBe("S235JR");
    expect(back.throat?.grade).toBe("S355JR");
    expect(back.columns?.grade).toBe("S235JR");
    // Every number comes back; in imperial through 6 significant digits, so to that precision.
    const at = (input: SizingInput, path: string): unknown =>
      path.split(".").reduce<unknown>((v, key) => (v as Record<string, unknown> | undefined)?.[key], input);
    for (const id of FIELD_IDS) {
      const want = at(FULL, FIELDS[id].path);
      const got = at(back, FIELDS[id].path);
      if (typeof want !== "number") continue;
      expect(typeof got, id).toBe("number");
      expect(Math.abs((got as number) / want - 1), id).toBeLessThan(1e-5);
    }
  });

  it("puts a bolster sent as the single `plate` into the bolster block", () => {
    const form = formFromInput({ ...FULL, plate: { role: "bolster", spanMm: 300, widthMm: 200, thicknessMm: 40, grade: "A36" }, plates: undefined }, "metric");
    expect(form.blocks.plate).toBe(false);
    expect(form.blocks.bolster).toBe(true);
    expect(form.values.bolsterWidthMm).toBe("200");
  });

  it("switches off blocks the input lacks and leaves absent optional fields blank", () => {
    const form = formFromInput({ cylinders: FULL.cylinders, pump: { kind: "single", flowLpm: 12 }, pressureBar: 180 }, "metric");
    expect(Object.values(form.blocks).every((on) => !on)).toBe(true);
    expect(form.values.reliefBar).toBe("");
    expect(form.values.flowLpm).toBe("12");
    expect(form.choices.pumpKind).toBe("single");
    const check = checkForm(form);
    expect(check.ok && check.input).toEqual({ cylinders: FULL.cylinders, pump: { kind: "single", flowLpm: 12 }, pressureBar: 180 });
  });
});
