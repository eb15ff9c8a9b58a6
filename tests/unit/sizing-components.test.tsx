// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen, within } from "@testing-library/react";
import { useState } from "react";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { CheckList, OverallVerdict } from "@/components/sizing/check-list";
import { SizingCalculator } from "@/components/sizing/sizing-calculator";
import { UnitSwitch } from "@/components/sizing/unit-switch";
import { UNIT_STORAGE_KEY } from "@/components/sizing/use-unit-system";
import type { Check } from "@/lib/hydraulics/types";
import type { UnitSystem } from "@/lib/units";

// The save form's server action and the chart library are not what these tests are about.
vi.mock("@/app/(public)/sizing/actions", () => ({ savePlannedPressAction: async () => ({ ok: false }) }));
vi.mock("@/components/sizing/sizing-charts", () => ({ default: () => <p>plots</p> }));

afterEach(cleanup);
beforeEach(() => window.localStorage.clear());

const CHECKS: Check[] = [
  { id: "a-ok", level: "ok", message: "Relief covers working pressure.", rule: "Relief at or above working.", source: "common practice (no published source)" },
  { id: "b-fail", level: "fail", message: "Hose rated below relief.", rule: "Every rating at or above relief.", source: "[J517] SAE J517 (2003)" },
  { id: "c-warn", level: "warn", message: "Line velocity high.", rule: "Pressure lines 3–10 m/s.", source: "[HYT] hytec-hydraulik.com, nominal width" },
];

describe("CheckList", () => {
  it("shows failures first, each with a word and an icon besides its colour, and its rule and source", () => {
    render(<CheckList checks={CHECKS} />);
    const cards = screen.getAllByRole("listitem");
    expect(cards.map((c) => c.getAttribute("data-check-id"))).toEqual(["b-fail", "c-warn", "a-ok"]);
    const fail = within(cards[0] as HTMLElement);
    expect(fail.getByText("Fail")).toBeTruthy();
    expect(fail.getByText("Hose rated below relief.")).toBeTruthy();
    expect(fail.getByText("Every rating at or above relief.")).toBeTruthy();
    expect(fail.getByText("[J517] SAE J517 (2003)")).toBeTruthy();
    expect(cards[0]?.querySelector("svg")).not.toBeNull();
    expect(within(cards[1] as HTMLElement).getByText("Warning")).toBeTruthy();
  });

  it("counts each level and folds the passing checks, still with their sources", () => {
    render(<CheckList checks={CHECKS} />);
    const summary = screen.getByLabelText("Check summary");
    expect(summary.textContent).toContain("1 fail");
    expect(summary.textContent).toContain("1 warning");
    expect(summary.textContent).toContain("1 ok");
    const folded = screen.getByText("Relief covers working pressure.").closest("details");
    expect(folded).not.toBeNull();
    expect(within(folded as HTMLElement).getByText("common practice (no published source)")).toBeTruthy();
  });

  it("says so when everything passes", () => {
    render(<CheckList checks={[CHECKS[0] as Check]} />);
    expect(screen.getByText("Every check that ran passes for these inputs.")).toBeTruthy();
  });
});

describe("OverallVerdict", () => {
  it("shows 'incomplete' in words with the missing checks, never only by colour", () => {
    render(<OverallVerdict overall="incomplete" missing={[{ id: "platen", label: "Platen between the rams" }]} />);
    const verdict = screen.getByTestId("overall-verdict");
    expect(verdict.textContent).toContain("Incomplete — not every safety check has run");
    expect(verdict.querySelector("svg")).not.toBeNull();
    expect(within(verdict).getByText("Platen between the rams")).toBeTruthy();
  });

  it("lists nothing when every safety check ran", () => {
    render(<OverallVerdict overall="ok" missing={[]} />);
    expect(screen.getByTestId("overall-verdict").textContent).toContain("OK — every safety check ran");
    expect(screen.queryByTestId("missing-checks")).toBeNull();
  });
});

describe("UnitSwitch", () => {
  function Harness({ start }: { start: UnitSystem }) {
    const [system, setSystem] = useState(start);
    return (
      <>
        <UnitSwitch value={system} onChange={setSystem} />
        <output>{system}</output>
      </>
    );
  }

  it("is a radio group whose checked option follows the value", () => {
    render(<Harness start="metric" />);
    const metric = screen.getByRole("radio", { name: "Metric" }) as HTMLInputElement;
    const imperial = screen.getByRole("radio", { name: "Imperial" }) as HTMLInputElement;
    expect(metric.checked).toBe(true);
    fireEvent.click(imperial);
    expect(imperial.checked).toBe(true);
    expect(metric.checked).toBe(false);
    expect(screen.getByRole("status").textContent).toBe("imperial");
  });
});

describe("SizingCalculator units", () => {
  const visitor = { signedIn: false, canSave: false, shopName: null };
  const field = (label: string): HTMLInputElement => screen.getByLabelText(label, { exact: false, selector: "input" });
  const force = (unit: string): string | undefined =>
    screen.getByTestId("working-force").querySelector(`[data-force-unit="${unit}"]`)?.textContent ?? undefined;

  it("keeps the same force when imperial input is switched to metric", () => {
    render(<SizingCalculator accountSystem={null} save={visitor} />);
    fireEvent.click(screen.getByRole("radio", { name: "Imperial" }));
    fireEvent.change(field("Bore (in)"), { target: { value: "4" } });
    fireEvent.change(field("Working pressure (psi)"), { target: { value: "2500" } });
    fireEvent.change(field("Relief valve setting (psi)"), { target: { value: "2500" } });
    // 4 in bore at 2500 psi: 15.708 short tons, 139.75 kN [reference §1, computed from formula]
    expect(force("shortTon")).toBe("15.7 US tonf");
    expect(force("kN")).toBe("140 kN");

    fireEvent.click(screen.getByRole("radio", { name: "Metric" }));
    expect(field("Bore (mm)").value).toBe("101.6");
    expect(field("Working pressure (bar)").value).toBe("172.369");
    expect(force("kN")).toBe("140 kN");
    expect(force("shortTon")).toBe("15.7 US tonf");
  });

  it("remembers a visitor's choice in this browser", () => {
    const first = render(<SizingCalculator accountSystem={null} save={visitor} />);
    fireEvent.click(screen.getByRole("radio", { name: "Imperial" }));
    expect(window.localStorage.getItem(UNIT_STORAGE_KEY)).toBe("imperial");
    first.unmount();
    render(<SizingCalculator accountSystem={null} save={visitor} />);
    expect((screen.getByRole("radio", { name: "Imperial" }) as HTMLInputElement).checked).toBe(true);
    // An untouched form starts from the imperial defaults, not the metric press converted.
    expect(field("Bore (in)").value).toBe("5");
  });

  it("starts a signed-in user in their saved preference", () => {
    window.localStorage.setItem(UNIT_STORAGE_KEY, "metric");
    render(<SizingCalculator accountSystem="imperial" save={{ signedIn: true, canSave: true, shopName: "Test shop" }} />);
    expect((screen.getByRole("radio", { name: "Imperial" }) as HTMLInputElement).checked).toBe(true);
    expect(screen.getByRole("button", { name: "Save as a planned press" })).toBeTruthy();
  });

  it("converts the same press when switched by hand, even before anything was typed", () => {
    render(<SizingCalculator accountSystem={null} save={visitor} />);
    fireEvent.click(screen.getByRole("radio", { name: "Imperial" }));
    expect(field("Bore (in)").value).toBe("4.92126"); // 125 mm / 25.4
    expect(force("kN")).toBe("245 kN");
  });

  it("marks a bad input and keeps the last valid figures, marked as such", () => {
    render(<SizingCalculator accountSystem={null} save={visitor} />);
    fireEvent.change(field("Rod diameter (mm)"), { target: { value: "130" } });
    expect(screen.getByText("The rod must be smaller than the bore (by at least 1 mm).")).toBeTruthy();
    expect(screen.getByText(/Showing the figures for the last valid inputs/)).toBeTruthy();
    expect(force("kN")).toBe("245 kN");
  });
});
