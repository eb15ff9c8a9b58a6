import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_PASSWORD } from "@/db/demo-data";
import { launchBrowser, newPage, screenshot, signIn } from "./browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser.close();
});

/** The working force shown in one unit ("kN", "tf" or "shortTon"). */
async function force(page: Page, unit: string): Promise<string | null> {
  return page.getByTestId("working-force").locator(`[data-force-unit="${unit}"]`).textContent();
}

async function overflow(page: Page): Promise<number> {
  return page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
}

describe("the sizing calculator", () => {
  it("keeps the same force when a bore and pressure typed in imperial are switched to metric", async () => {
    const { context, page } = await newPage(browser);
    await page.goto("/sizing");
    await page.getByRole("radio", { name: "Imperial" }).check({ force: true });
    await page.getByLabel("Bore (in)").fill("4");
    await page.getByLabel("Working pressure (psi)").fill("2500");
    await page.getByLabel("Relief valve setting (psi)").fill("2500");
    // 4 in bore at 2500 psi: 15.708 short tons = 139.75 kN [hydraulics reference §1, computed from formula]
    await expect.poll(() => force(page, "shortTon")).toBe("15.7 US tonf");
    expect(await force(page, "kN")).toBe("140 kN");

    await page.getByRole("radio", { name: "Metric" }).check({ force: true });
    expect(await page.getByLabel("Bore (mm)").inputValue()).toBe("101.6");
    expect(await page.getByLabel("Working pressure (bar)").inputValue()).toBe("172.369");
    await expect.poll(() => force(page, "kN")).toBe("140 kN");
    expect(await force(page, "shortTon")).toBe("15.7 US tonf");

    // The plots load after the calculator, from the chart library.
    await page.getByRole("heading", { name: /Ram speed of each stage/ }).waitFor();
    expect(await page.locator(".recharts-surface").count()).toBeGreaterThanOrEqual(3);
    await screenshot(page, "sizing-1280");
    await context.close();
  });

  it("has no horizontal overflow at 360 px and keeps the force in sight while typing", async () => {
    const { context, page } = await newPage(browser, 360, 740);
    await page.goto("/sizing");
    await page.getByRole("heading", { name: /Ram speed of each stage/ }).waitFor();
    expect(await overflow(page)).toBe(0);
    await page.getByLabel("Bore (mm)").fill("150");
    // 200 bar on 150 mm: 353.4 kN (computed from formula), shown in the bar that sticks below the form.
    await expect.poll(() => page.getByRole("link", { name: /353 kN/ }).isVisible()).toBe(true);
    await page.getByRole("button", { name: "Find a bore" }).click();
    await page.getByTestId("required-bore").waitFor();
    expect(await overflow(page)).toBe(0);
    await screenshot(page, "sizing-360");
    await context.close();
  });

  it("finds the bore for 30 t at 200 bar and copies it into the design", async () => {
    const { context, page } = await newPage(browser);
    await page.goto("/sizing");
    await page.getByRole("button", { name: "Find a bore" }).click();
    // 30 t(f) = 294.2 kN at 200 bar needs 136.9 mm (computed from formula); ISO 3320 next size up is 160 mm.
    expect(await page.getByTestId("required-bore").textContent()).toBe("137 mm");
    await page.getByRole("button", { name: "Use 160 mm" }).click();
    expect(await page.getByLabel("Bore (mm)").inputValue()).toBe("160");
    await context.close();
  });

  it("opens a gauge card with a row every 10 bar up to the relief setting", async () => {
    const { context, page } = await newPage(browser);
    await page.goto("/sizing");
    await page.getByLabel("Press name").fill("Gauge test press");
    await page.getByRole("link", { name: "Open the gauge card" }).click();
    await page.waitForURL("**/sizing/gauge-card?**");
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe("Gauge test press");
    const rows = page.locator("table tbody tr");
    expect(await rows.count()).toBe(21); // 10 … 210 bar
    expect(await rows.first().locator("th").textContent()).toBe("10");
    // 210 bar on 125 mm: 257.7 kN (computed from formula)
    expect(await rows.last().locator("td").first().textContent()).toBe("258");
    await page.emulateMedia({ media: "print" });
    expect(await page.locator("header.no-print").first().isHidden()).toBe(true);
    await screenshot(page, "gauge-card-print");
    await context.close();
  });
});

describe("saving a planned press", () => {
  it("a visitor signs in as a shop manager, keeps the inputs, saves them and lands on the new press", async () => {
    const { context, page } = await newPage(browser);
    await page.goto("/sizing");
    const name = `Planned ${Date.now().toString(36)}`;
    await page.getByLabel("Bore (mm)").fill("140");
    await page.getByLabel("Press name").fill(name);
    await page.getByRole("link", { name: "Sign in", exact: true }).last().click();
    await page.waitForURL("**/sign-in?next=**");
    await page.getByLabel("E-mail").fill("dana@millrace-forge.example");
    await page.getByLabel("Password").fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL("**/sizing?input=**");
    expect(await page.getByLabel("Bore (mm)").inputValue()).toBe("140");
    expect(await page.getByLabel("Press name").inputValue()).toBe(name);

    await page.getByLabel("Frame type").selectOption("four-post");
    await page.getByRole("button", { name: "Save as a planned press" }).click();
    await page.waitForURL(/\/presses\/[a-z2-7]{24}$/);
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe(name);
    await expect.poll(() => page.getByText("Planned", { exact: true }).first().isVisible()).toBe(true);
    // Rated force is the force at the 210 bar relief on a 140 mm bore: 323.3 kN (computed from formula)
    expect(await page.getByText("323 kN").first().isVisible()).toBe(true);
    // The sizing's parts came along as components of the planned press.
    expect(await page.getByTestId("component-list").textContent()).toContain("Bore 140 mm");
    await page.goto("/dashboard");
    await page.getByText(name).first().waitFor();
    await context.close();
  });

  it("a member is told only a manager can add presses", async () => {
    const { context, page } = await newPage(browser);
    await signIn(page, "tess@millrace-forge.example");
    await page.goto("/sizing");
    // The page is prerendered: what the visitor may do arrives from /api/session after it is shown.
    await page.getByText(/Only a manager of Millrace Community Forge can add presses/).waitFor();
    expect(await page.getByRole("button", { name: "Save as a planned press" }).count()).toBe(0);
    await context.close();
  });
});
