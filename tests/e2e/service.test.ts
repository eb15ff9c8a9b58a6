import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser, newPage, screenshot, signIn } from "./browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser.close();
});

describe("service", () => {
  it("a manager logs a filter change with the hour meter: the task moves from overdue to later and the dashboard's due list changes", async () => {
    const { context, page } = await newPage(browser);
    await signIn(page, "dana@millrace-forge.example");
    const dueList = page.getByTestId("due-list");
    const filterDue = dueList.getByRole("listitem").filter({ hasText: "Change the filter element" }).filter({ hasText: "Bay 1 H-frame" });
    expect(await filterDue.textContent()).toContain("Overdue");
    expect(await dueList.textContent()).toContain("Check the relief valve setting");
    await screenshot(page, "service-dashboard-before");

    await filterDue.getByRole("link").click();
    await page.waitForURL(/\/presses\/[a-z2-7]{24}#service$/);
    const pressUrl = page.url().replace(/#service$/, "");
    const task = page.getByTestId("service-task").filter({ hasText: "Change the filter element" });
    expect(await task.textContent()).toContain("Overdue");

    await page.getByRole("link", { name: "Log service" }).click();
    await page.waitForURL("**/service/new");
    const hoursField = page.getByLabel("Hour meter (h) — optional");
    const last = Number((await hoursField.getAttribute("placeholder"))!.replace("last ", ""));
    await page.getByLabel("Work done").selectOption("filter-changed");
    // Below the last reading: refused on the field's form, nothing saved, what was typed kept.
    await hoursField.fill(String(last - 10));
    await page.getByLabel(/Parts used/).fill("1 × Return-line filter element, 10 µm");
    await page.getByRole("button", { name: "Log service" }).click();
    await expect.poll(() => page.getByRole("alert").first().textContent()).toContain("cannot go backwards");
    expect(await page.getByLabel(/Parts used/).inputValue()).toContain("Return-line filter element");

    await hoursField.fill(String(last + 1.5));
    await page.getByLabel(/Cost/).fill("24.50");
    await page.getByRole("button", { name: "Log service" }).click();
    await page.waitForURL(`${pressUrl}#service`);
    const taskAfter = page.getByTestId("service-task").filter({ hasText: "Change the filter element" });
    expect(await taskAfter.textContent()).toContain("Later");
    expect(await taskAfter.textContent()).toContain(`at ${last + 1.5} h`);
    const firstRow = page.getByTestId("service-log").locator("tbody tr").first();
    expect(await firstRow.textContent()).toContain("Filter element changed");
    expect(await firstRow.textContent()).toContain(`${last + 1.5} h`);
    await screenshot(page, "service-press-after");

    await page.goto("/dashboard");
    const after = await page.getByTestId("due-list").textContent();
    expect(after).not.toMatch(/Change the filter element\s*Bay 1 H-frame/);
    expect(after).toContain("Check the relief valve setting");
    await screenshot(page, "service-dashboard-after");

    await page.setViewportSize({ width: 390, height: 844 });
    await page.goto(`${pressUrl}#service`);
    await screenshot(page, "service-press-phone");
    await context.close();
  });
});
