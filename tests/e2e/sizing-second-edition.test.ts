import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser, newPage, screenshot, signIn } from "./browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser.close();
});

const verdict = (page: Page) => page.getByTestId("overall-verdict");
const overall = (page: Page) => verdict(page).getAttribute("data-overall");
const missingIds = (page: Page) =>
  page.locator("[data-missing-id]").evaluateAll((items) => items.map((li) => li.getAttribute("data-missing-id")));

describe("sizing, second edition", () => {
  it("shows 'incomplete' with the missing checks until frame, ratings and buckling are filled in", async () => {
    const { context, page } = await newPage(browser);
    await page.goto("/sizing");
    await page.getByRole("checkbox", { name: "Rod buckling" }).uncheck();
    await page.getByRole("checkbox", { name: "Component ratings" }).uncheck();
    await expect.poll(() => overall(page)).toBe("incomplete");
    expect(await verdict(page).textContent()).toContain("Incomplete");
    expect(await missingIds(page)).toEqual([
      "rating-hose", "rating-valve", "rating-pump", "rating-cylinder", "plate-bolster", "columns", "rod-buckling",
    ]);
    await screenshot(page, "sizing-incomplete-1280");

    await page.getByRole("checkbox", { name: "Rod buckling" }).check();
    await page.getByRole("checkbox", { name: "Component ratings" }).check();
    await page.getByRole("checkbox", { name: "Bolster" }).check();
    await expect.poll(() => missingIds(page)).toEqual(["columns"]);
    await page.getByRole("checkbox", { name: "Side columns or tie rods" }).check();
    await expect.poll(() => missingIds(page)).toEqual([]);
    expect(["ok", "warn"]).toContain(await overall(page));
    await context.close();
  });

  it("a built-up bolster is edited by its section modulus and second moment", async () => {
    const { context, page } = await newPage(browser);
    await page.goto("/sizing");
    await page.getByRole("checkbox", { name: "Bolster" }).check();
    await page.locator("#sizing-bolsterSection").selectOption("built-up");
    await page.getByLabel("Section modulus (mm³)").last().fill("20000");
    await page.getByLabel("Second moment of area (mm⁴)").last().fill("1000000");
    // Hand calculation: 257.7 kN × 300 mm / 4 = 19.33 kN·m over 20,000 mm³ = 966 MPa: far past yield
    await expect.poll(() => page.locator('[data-check-id="plate-bolster"]').getAttribute("data-level")).toBe("fail");
    await context.close();
  });

  it("a two-ram design with a thin platen fails and names the platen", async () => {
    const { context, page } = await newPage(browser, 390, 844);
    await page.goto("/sizing");
    await page.getByLabel("Cylinders in parallel").fill("2");
    await expect.poll(() => missingIds(page)).toContain("platen");
    await page.getByRole("checkbox", { name: "Platen between the rams" }).check();
    await page.getByLabel("Platen thickness (mm)").fill("20");
    const card = page.locator('[data-check-id="platen"]');
    await expect.poll(() => card.getAttribute("data-level")).toBe("fail");
    expect(await card.textContent()).toContain("Platen between 2 rods");
    expect(await overall(page)).toBe("fail");
    await card.scrollIntoViewIfNeeded();
    await screenshot(page, "sizing-thin-platen-390");
    await context.close();
  });

  it("the schematic follows the frame: a throat draws an open (C) frame", async () => {
    const { context, page } = await newPage(browser);
    await page.goto("/sizing");
    expect(await page.locator("[data-frame]").getAttribute("data-frame")).toBe("h-frame");
    await page.getByRole("checkbox", { name: "Open (C) frame throat" }).check();
    await expect.poll(() => page.locator("[data-frame]").getAttribute("data-frame")).toBe("c-frame");
    expect(await page.locator('[data-check-id="throat"]').textContent()).toContain("tilts the dies");
    await context.close();
  });

  it("the gauge card of the demo four-post shows its welding dies' limit", async () => {
    const { context, page } = await newPage(browser);
    await signIn(page, "dana@millrace-forge.example");
    await page.getByRole("link", { name: "Four-post 60" }).first().click();
    await page.waitForURL(/\/presses\/[a-z2-7]{24}$/);
    await page.goto(`${new URL(page.url()).pathname}/gauge-card`);
    // Hand calculation: 450 kN over 2 × π/4 × 140² mm² = 30,788 mm² → 146.2 bar
    expect(await page.getByTestId("die-limits").textContent()).toContain("With the Welding dies: never above 146.2 bar");
    await screenshot(page, "gauge-card-die-limit");
    await context.close();
  });
});
