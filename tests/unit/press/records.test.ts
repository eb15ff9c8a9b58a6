import { describe, expect, it } from "vitest";
import { csvCell, toCsv } from "@/lib/csv";
import { centsValue, displayValue, quantityValue, specFromForm } from "@/lib/press/form-values";
import { partsTotals } from "@/lib/press/parts-list";
import { specSummary } from "@/lib/press/spec-summary";
import { pressTimeline } from "@/lib/press/timeline";

const line = (costCents: number | null, purchased: boolean) => ({ id: "x", kind: "hose", label: "h", maker: null, partNumber: null, supplier: null, costCents, purchased });

describe("parts list totals", () => {
  it("adds bought and still-to-buy separately, in whole cents", () => {
    expect(partsTotals([line(1050, true), line(1999, false), line(null, false)])).toEqual({ totalCents: 3049, boughtCents: 1050, toBuyCents: 1999, unpricedCount: 1, toBuyCount: 2 });
  });
});

describe("CSV", () => {
  it("quotes per RFC 4180 and defuses formula cells (OWASP CSV injection)", () => {
    expect(csvCell('say "hi", then')).toBe('"say ""hi"", then"');
    expect(csvCell("=1+1")).toBe("'=1+1");
    expect(csvCell("-5 bar")).toBe("'-5 bar");
    expect(csvCell(-5)).toBe("-5");
    expect(toCsv(["a", "b"], [[1, null]])).toBe("a,b\r\n1,\r\n");
  });
});

describe("form values", () => {
  it("converts typed imperial quantities to SI and keeps nonsense for the schema to reject", () => {
    // 5 in = 127 mm exactly (inch = 25.4 mm, hydraulics-reference.md §11)
    expect(quantityValue("5", "length", "imperial")).toBeCloseTo(127, 10);
    expect(quantityValue("", "length", "metric")).toBeUndefined();
    expect(quantityValue("five", "length", "metric")).toBe("five");
    expect(displayValue(127, "length", "imperial")).toBe("5");
    expect(centsValue("£12.50")).toBe(1250);
    expect(centsValue("")).toBeNull();
  });

  it("reads a kind's spec fields from `spec.*` names", () => {
    const spec = specFromForm("hose", { "spec.line": "pressure", "spec.insideDiameterMm": "0.5", "spec.standard": "SAE 100R2AT", "spec.ratedPressureBar": "4000", "spec.lengthMm": "" }, "imperial");
    expect(spec).toMatchObject({ line: "pressure", standard: "SAE 100R2AT" });
    expect(spec.insideDiameterMm).toBeCloseTo(12.7, 10);
    // 4000 psi = 275.79 bar (psi = 6894.757 Pa, §11)
    expect(spec.ratedPressureBar as number).toBeCloseTo(275.79, 2);
    expect(spec).not.toHaveProperty("lengthMm");
  });
});

describe("spec summary", () => {
  it("shows a part's figures in the user's units without padded zeros", () => {
    const s = specSummary({ kind: "cylinder", boreMm: 127, rodMm: 63.5, strokeMm: 200, ratedPressureBar: 250, endFixity: "fixed-pinned" }, "metric");
    expect(s).toBe("Bore 127 mm · Rod 63.5 mm · Stroke 200 mm · Rated pressure 250 bar · Rod end fixity: fixed-pinned");
  });
});

describe("timeline", () => {
  it("orders events newest first and tells a replacement from a removal", () => {
    const parts = [
      { id: "a", label: "Hose A", installedOn: "2026-01-01", removedOn: "2026-03-01", removalReason: "Chafed", replacedById: "b" },
      { id: "b", label: "Hose B", installedOn: "2026-03-01", removedOn: null, removalReason: null, replacedById: null },
      { id: "c", label: "Die", installedOn: "2026-01-05", removedOn: "2026-02-01", removalReason: "Cracked", replacedById: null },
    ];
    const events = pressTimeline(new Date("2025-12-31T10:00:00Z"), parts, [{ hours: 12, readAt: new Date("2026-02-15T08:00:00Z"), note: null }]);
    expect(events.map((e) => e.title)).toEqual([
      "Hose A replaced by Hose B",
      "Hose B installed",
      "Hour meter read 12 h",
      "Die removed",
      "Die installed",
      "Hose A installed",
      "Press record created",
    ]);
    expect(events[0]!.detail).toBe("Chafed");
  });

  it("keeps the newest events only, and names a successor that is outside the window by its label", () => {
    const parts = [{ id: "a", label: "Filter 1", installedOn: "2026-01-01", removedOn: "2026-03-01", removalReason: null, replacedById: "gone", replacedByLabel: "Filter 2" }];
    const events = pressTimeline(new Date("2025-12-31T10:00:00Z"), parts, [], 2);
    expect(events.map((e) => e.title)).toEqual(["Filter 1 replaced by Filter 2", "Filter 1 installed"]);
  });
});
