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

async function addPart(page: Page, pressUrl: string, kind: string, label: string, fields: Record<string, string>, selects: Record<string, string> = {}): Promise<void> {
  await page.goto(`${pressUrl}/components/new`);
  await page.getByLabel("Kind of part").selectOption(kind);
  await page.getByLabel("Name", { exact: true }).fill(label);
  for (const [name, value] of Object.entries(selects)) await page.locator(`select[name="spec.${name}"]`).selectOption(value);
  for (const [name, value] of Object.entries(fields)) await page.locator(`input[name="spec.${name}"]`).fill(value);
  await page.getByRole("button", { name: "Add part" }).click();
  await page.waitForURL(`**${new URL(pressUrl).pathname}#components`);
}

describe("press records", () => {
  it("a manager builds a press, the as-built check catches a weak hose, and replacing it clears the check", async () => {
    const { context, page } = await newPage(browser);
    await signIn(page, "dana@millrace-forge.example");
    await page.goto("/presses");
    await page.getByRole("link", { name: "New press" }).click();
    await page.getByLabel("Name").fill("Test-bench press");
    await page.getByLabel("Frame type").selectOption("h-frame");
    await page.getByLabel("Lifecycle").selectOption("building");
    await page.getByLabel("Working pressure (bar)").fill("180");
    await page.getByRole("button", { name: "Create press" }).click();
    await page.waitForURL(/\/presses\/[a-z2-7]{24}$/);
    const pressUrl = page.url();

    await addPart(page, pressUrl, "cylinder", "Main cylinder", { boreMm: "127", rodMm: "63.5", strokeMm: "200", ratedPressureBar: "250" });
    await addPart(page, pressUrl, "pump", "Pump", { flowLpm: "8", ratedPressureBar: "250" }, { pumpKind: "single" });
    await addPart(page, pressUrl, "motor", "Motor", { powerKw: "4" });
    await addPart(page, pressUrl, "relief-valve", "Relief valve", { settingBar: "200" });
    await addPart(page, pressUrl, "hose", "Cap-end hose", { insideDiameterMm: "12.7", standard: "SAE 100R1AT", ratedPressureBar: "160", lengthMm: "1200" }, { line: "pressure" });

    const alert = page.getByTestId("as-built-alert");
    await alert.waitFor();
    expect(await alert.textContent()).toContain("Cap-end hose");
    await screenshot(page, "press-as-built-fail");

    await page.getByRole("link", { name: "Replace Cap-end hose" }).click();
    // A click before the press page has hydrated loads the form in full; typing before the form
    // hydrates would then be lost, so wait for the page to finish loading.
    await page.waitForURL("**/replace", { waitUntil: "load" });
    await page.getByLabel("Reason").fill("Rated below the relief setting");
    await page.locator('input[name="spec.standard"]').fill("SAE 100R2AT");
    await page.locator('input[name="spec.ratedPressureBar"]').fill("276");
    await page.getByRole("button", { name: "Replace part" }).click();
    await page.waitForURL("**#history");

    expect(await page.getByTestId("as-built-alert").count()).toBe(0);
    const timeline = await page.getByTestId("press-timeline").textContent();
    expect(timeline).toContain("Cap-end hose replaced by Cap-end hose");
    expect(timeline).toContain("Rated below the relief setting");
    const parts = await page.getByTestId("component-list").textContent();
    expect(parts).toContain("276 bar");
    expect(parts).not.toContain("160 bar");
    await screenshot(page, "press-as-built-pass");
    await context.close();
  });

  it("shows clear field errors for impossible dimensions and keeps the typed values", async () => {
    const { context, page } = await newPage(browser, 390, 844);
    await signIn(page, "dana@millrace-forge.example");
    await page.goto("/presses");
    await page.getByRole("link", { name: "Bay 1 H-frame" }).click();
    await page.waitForURL(/\/presses\/[a-z2-7]{24}$/);
    await page.getByTestId("component-list").waitFor();
    // The parts table scrolls inside its card; the press page itself must not scroll sideways at phone width.
    expect(await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth)).toBeLessThanOrEqual(0);
    await screenshot(page, "press-390");
    await page.goto(`${page.url()}/components/new`);
    await page.getByLabel("Name", { exact: true }).fill("Odd cylinder");
    await page.locator('input[name="spec.boreMm"]').fill("80");
    await page.locator('input[name="spec.rodMm"]').fill("90");
    await page.locator('input[name="spec.strokeMm"]').fill("lots");
    await page.getByRole("button", { name: "Add part" }).click();
    await page.getByText("The rod must be smaller than the bore.").waitFor();
    await page.getByText("Stroke must be a number.").waitFor();
    expect(await page.locator('input[name="spec.rodMm"]').inputValue()).toBe("90");
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await context.close();
  });

  it("lets a member read a press but gives the 403 page for editing it", async () => {
    const { context, page } = await newPage(browser);
    await signIn(page, "tess@millrace-forge.example");
    await page.goto("/presses");
    await page.getByRole("link", { name: "Bench C-frame" }).click();
    await page.waitForURL(/\/presses\/[a-z2-7]{24}$/);
    expect(await page.getByRole("link", { name: "Edit press" }).count()).toBe(0);
    const res = await page.goto(`${page.url()}/edit`);
    expect(res?.status()).toBe(403);
    await context.close();
  });

  it("shows the costed parts list of the demo planned press with totals", async () => {
    const { context, page } = await newPage(browser);
    await signIn(page, "lena@garage-build.example");
    await page.goto("/presses");
    await page.getByRole("link", { name: "Garage press (planned)" }).click();
    await page.getByRole("link", { name: "Parts list" }).click();
    const totals = await page.getByTestId("parts-totals").textContent();
    expect(totals).toContain("$1,117.00"); // sum of the demo parts' prices in db/demo-parts.ts
    expect(totals).toContain("$807.00 (6)"); // the six parts not yet bought
    await screenshot(page, "parts-list");
    await context.close();
  });
});
