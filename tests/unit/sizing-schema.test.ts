import { describe, expect, it } from "vitest";
import { evaluateSizing, INPUT_LIMITS, type SizingInput } from "@/lib/hydraulics";
import { gaugeCardHref } from "@/components/sizing/links";
import { gaugeCardQuerySchema } from "@/lib/validation/gauge-card";
import { plannedPressSchema } from "@/lib/validation/planned-press";
import { BODY_KEY, problemFieldErrors, sizingFieldErrors, sizingInputSchema } from "@/lib/validation/sizing";
import { FULL_SIZING_INPUT } from "../fixtures/sizing-inputs";

const MINIMAL: SizingInput = {
  cylinders: { count: 1, boreMm: 125, rodMm: 70, strokeMm: 250 },
  pump: { kind: "single", flowLpm: 12 },
  pressureBar: 200,
};

const FULL = FULL_SIZING_INPUT;

/** Field errors of an input the schema must refuse. */
function errorsOf(input: unknown): Record<string, string[]> {
  const parsed = sizingInputSchema.safeParse(input);
  if (parsed.success) throw new Error("expected the schema to refuse this input");
  return sizingFieldErrors(parsed.error);
}

const withCylinders = (patch: Partial<SizingInput["cylinders"]>): unknown => ({ ...MINIMAL, cylinders: { ...MINIMAL.cylinders, ...patch } });

describe("sizingInputSchema: second-edition blocks", () => {
  it("accepts plates, platen (solid or built-up), throat (solid or built-up), dies and a usable tank volume", () => {
    const input = {
      ...MINIMAL,
      reservoir: { volumeL: 100, usableL: 40 },
      platen: { rodSpacingMm: 300, dieWidthMm: 100, thicknessMm: 50, grade: "S355JR", sectionModulusMm3: 2e5, inertiaMm4: 2e7 },
      throat: { depthMm: 200, heightMm: 500, thicknessMm: 40, grade: "A36", areaMm2: 12_000, sectionModulusMm3: 6e5, inertiaMm4: 9e7 },
      dies: [{ name: "Fullers", maxForceKn: 120 }],
    };
    expect(sizingInputSchema.parse(input)).toEqual(input);
  });

  it("names each bad key of the new blocks", () => {
    const errors = errorsOf({
      ...MINIMAL,
      platen: { rodSpacingMm: 300, dieWidthMm: -1, thicknessMm: 50, grade: "S355JR", widthMm: 200, sectionModulusMm3: 1e5, extra: 1 },
      throat: { depthMm: 200, heightMm: 500, thicknessMm: 40, grade: "A36", areaMm2: 12_000 },
      dies: [{ name: "", maxForceKn: 0 }],
      reservoir: { volumeL: 10, usableL: 20 },
      plates: [
        { role: "bolster", spanMm: 300, widthMm: 200, thicknessMm: 40, grade: "A36" },
        { role: "bolster", spanMm: 300, widthMm: 200, thicknessMm: 40, grade: "A36" },
      ],
    });
    expect(Object.keys(errors).sort()).toEqual(
      [
        "dies.0.maxForceKn",
        "dies.0.name",
        "plates",
        "platen.dieWidthMm",
        "platen.extra",
        "platen.widthMm",
        "reservoir.usableL",
        "throat.inertiaMm4",
        "throat.sectionModulusMm3",
      ].sort(),
    );
    expect(errors["platen.extra"]).toEqual(['Unknown field "extra".']);
  });
});

describe("sizingInputSchema: good input", () => {
  it("accepts the minimal input and returns it unchanged", () => {
    expect(sizingInputSchema.parse(MINIMAL)).toEqual(MINIMAL);
  });

  it("accepts every optional block, and the engine sizes what it returns", () => {
    const parsed = sizingInputSchema.parse(FULL);
    expect(parsed).toEqual(FULL);
    expect(evaluateSizing(parsed).checks.length).toBeGreaterThan(10);
  });

  it("accepts a built-up plate given by section modulus and inertia instead of width", () => {
    const plate = { role: "bolster", spanMm: 610, thicknessMm: 25.4, grade: "A36", sectionModulusMm3: 196_645, inertiaMm4: 14_984_000 };
    expect(sizingInputSchema.parse({ ...MINIMAL, plate }).plate).toEqual(plate);
  });

  it("accepts the limits themselves", () => {
    const [lo, hi] = INPUT_LIMITS.pressureBar;
    expect(sizingInputSchema.safeParse({ ...MINIMAL, pressureBar: lo }).success).toBe(true);
    expect(sizingInputSchema.safeParse({ ...MINIMAL, pressureBar: hi }).success).toBe(true);
  });
});

describe("sizingInputSchema: bad input gets one message per field", () => {
  it.each([
    ["zero bore", withCylinders({ boreMm: 0 }), "cylinders.boreMm", "Bore must be from 1 to 2000 mm."],
    ["negative bore", withCylinders({ boreMm: -50 }), "cylinders.boreMm", "Bore must be from 1 to 2000 mm."],
    ["rod equal to bore", withCylinders({ rodMm: 125 }), "cylinders.rodMm", "The rod must be smaller than the bore (by at least 1 mm)."],
    ["rod larger than bore", withCylinders({ rodMm: 130 }), "cylinders.rodMm", "The rod must be smaller than the bore (by at least 1 mm)."],
    ["half a cylinder", withCylinders({ count: 1.5 }), "cylinders.count", "Cylinder count must be a whole number."],
    ["nine cylinders", withCylinders({ count: 9 }), "cylinders.count", "Cylinder count must be from 1 to 8."],
    ["a string", { ...MINIMAL, pressureBar: "200" }, "pressureBar", "Working pressure must be a number (bar)."],
    ["NaN", { ...MINIMAL, pressureBar: Number.NaN }, "pressureBar", "Working pressure must be a number (bar)."],
    ["Infinity", { ...MINIMAL, pressureBar: Number.POSITIVE_INFINITY }, "pressureBar", "Working pressure must be a number (bar)."],
    ["null", { ...MINIMAL, pressureBar: null }, "pressureBar", "Working pressure must be a number (bar)."],
    ["absurd pressure", { ...MINIMAL, pressureBar: 1e300 }, "pressureBar", "Working pressure must be from 0.1 to 2000 bar."],
    ["efficiency as a percentage", { ...MINIMAL, overallEfficiency: 85 }, "overallEfficiency", "Overall efficiency must be from 0.1 to 1 (fraction, 0.85 = 85 %)."],
    ["press distance beyond the stroke", { ...MINIMAL, pressDistanceMm: 251 }, "pressDistanceMm", "Pressing distance must not exceed the stroke."],
    ["an unknown pump kind", { ...MINIMAL, pump: { kind: "triple", flowLpm: 3 } }, "pump.kind", 'Pump kind must be "single" or "two-stage".'],
    ["an unknown steel grade", { ...MINIMAL, columns: { count: 2, diameterMm: 40, grade: "mild" } }, "columns.grade", "Column steel grade must be one of: S235JR, S355JR, A36."],
  ])("%s", (_name, input, path, message) => {
    expect(errorsOf(input)[path]).toEqual([message]);
  });

  it("names every missing required field", () => {
    const errors = errorsOf({ cylinders: { count: 1 }, pump: { kind: "single" } });
    expect(errors["cylinders.boreMm"]).toEqual(["Bore is required."]);
    expect(errors["cylinders.rodMm"]).toEqual(["Rod diameter is required."]);
    expect(errors["cylinders.strokeMm"]).toEqual(["Stroke is required."]);
    expect(errors["pump.flowLpm"]).toEqual(["Pump flow is required."]);
    expect(errors.pressureBar).toEqual(["Working pressure is required."]);
    // A missing bore is reported once, not again as "rod must be smaller".
    expect(errors["cylinders.rodMm"]).toHaveLength(1);
  });

  it("describes a missing block and a body that is not an object", () => {
    expect(errorsOf({ pressureBar: 200 }).cylinders).toEqual(["cylinders is required: { count, boreMm, rodMm, strokeMm }."]);
    expect(errorsOf({ ...MINIMAL, lines: [] }).lines).toEqual(["lines must be an object: { suctionIdMm?, pressureIdMm?, returnIdMm? }."]);
    expect(errorsOf([1, 2])[BODY_KEY]).toEqual(["Send a JSON object with the sizing input."]);
    expect(errorsOf("text")[BODY_KEY]).toEqual(["Send a JSON object with the sizing input."]);
  });

  it("rejects unknown keys at every level, each under its own path", () => {
    const errors = errorsOf({ ...MINIMAL, colour: "red", cylinders: { ...MINIMAL.cylinders, boreInches: 4 }, ratings: { hosePsi: 3000 } });
    expect(errors).toEqual({
      colour: ['Unknown field "colour".'],
      "cylinders.boreInches": ['Unknown field "boreInches".'],
      "ratings.hosePsi": ['Unknown field "hosePsi".'],
    });
  });

  it("keeps a two-stage pump's pressing flow within its total flow", () => {
    const pump = { kind: "two-stage", approachFlowLpm: 8, pressingFlowLpm: 40, unloadBar: 40 };
    expect(errorsOf({ ...MINIMAL, pump })["pump.pressingFlowLpm"]).toEqual([
      "Pressing flow (the small section) must not exceed the approach (total) flow.",
    ]);
  });

  it("wants a plate's width, or both section figures, never both or neither", () => {
    const base = { role: "crosshead", spanMm: 300, thicknessMm: 50, grade: "S355JR" };
    expect(Object.keys(errorsOf({ ...MINIMAL, plate: base }))).toEqual(["plate.widthMm"]);
    expect(Object.keys(errorsOf({ ...MINIMAL, plate: { ...base, sectionModulusMm3: 1000 } }))).toEqual(["plate.inertiaMm4"]);
    expect(Object.keys(errorsOf({ ...MINIMAL, plate: { ...base, widthMm: 200, sectionModulusMm3: 1000, inertiaMm4: 1e6 } }))).toEqual([
      "plate.widthMm",
    ]);
  });

  it("maps the engine's own refusals to the same shape", () => {
    expect(problemFieldErrors([{ path: "cylinders.rodMm", message: "must be at least 1 mm smaller than the bore" }])).toEqual({
      "cylinders.rodMm": ["cylinders.rodMm must be at least 1 mm smaller than the bore."],
    });
  });
});

describe("gaugeCardQuerySchema", () => {
  it("reads SI figures from the query string, with defaults for count, units and name", () => {
    expect(gaugeCardQuerySchema.parse({ bore: "125", relief: "210" })).toEqual({ bore: 125, count: 1, relief: 210, units: "metric", name: "" });
  });

  it("round-trips the link the sizing page makes", () => {
    const href = gaugeCardHref({ boreMm: 101.6, count: 2, reliefBar: 172.369, units: "imperial", name: "  Big Red  " });
    const query = Object.fromEntries(new URL(href, "http://x").searchParams);
    expect(gaugeCardQuerySchema.parse(query)).toEqual({ bore: 101.6, count: 2, relief: 172.369, units: "imperial", name: "Big Red" });
  });

  it("refuses missing, non-numeric, out-of-range and unknown parameters", () => {
    expect(gaugeCardQuerySchema.safeParse({ relief: "210" }).success).toBe(false);
    expect(gaugeCardQuerySchema.safeParse({ bore: "abc", relief: "210" }).success).toBe(false);
    expect(gaugeCardQuerySchema.safeParse({ bore: "125", relief: "5000" }).success).toBe(false);
    expect(gaugeCardQuerySchema.safeParse({ bore: "125", relief: "210", count: "0" }).success).toBe(false);
    expect(gaugeCardQuerySchema.safeParse({ bore: "125", relief: "210", units: "cubits" }).success).toBe(false);
    expect(gaugeCardQuerySchema.safeParse({ bore: "125", relief: "210", debug: "1" }).success).toBe(false);
  });
});

describe("plannedPressSchema", () => {
  const form = { name: " Shop press ", frameType: "h-frame", sizingInput: JSON.stringify(MINIMAL) };

  it("parses the hidden JSON through the sizing schema", () => {
    expect(plannedPressSchema.parse(form)).toEqual({ name: "Shop press", frameType: "h-frame", sizingInput: MINIMAL });
  });

  it("refuses a blank name, an unknown frame, broken JSON and an invalid sizing", () => {
    const fieldsOf = (patch: Record<string, unknown>): string[] => {
      const parsed = plannedPressSchema.safeParse({ ...form, ...patch });
      return parsed.success ? [] : parsed.error.issues.map((i) => i.path.join("."));
    };
    expect(fieldsOf({ name: "   " })).toEqual(["name"]);
    expect(fieldsOf({ frameType: "tower" })).toEqual(["frameType"]);
    expect(fieldsOf({ sizingInput: "{not json" })).toEqual(["sizingInput"]);
    expect(fieldsOf({ sizingInput: JSON.stringify({ ...MINIMAL, pressureBar: -1 }) })).toEqual(["sizingInput.pressureBar"]);
  });
});
