import { and, eq, isNotNull } from "drizzle-orm";
import { drizzle } from "drizzle-orm/mysql2";
import mysql from "mysql2/promise";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { appDatabaseUrl } from "@/db/config";
import { inspectionAnswerOps, inspectionAnswers } from "@/db/schema";
import { launchBrowser, newPage, screenshot, signIn } from "./browser";

let browser: Browser;
let pool: mysql.Pool;
beforeAll(async () => {
  browser = await launchBrowser();
  pool = mysql.createPool({ uri: appDatabaseUrl(), timezone: "Z", connectionLimit: 2 });
});
afterAll(async () => {
  await browser.close();
  await pool.end();
});

/** From a press page, starts the named checklist and waits for the run. Returns the inspection id. */
async function startFromPress(page: Page, pressName: string, checklist: string): Promise<string> {
  await page.goto("/presses");
  await page.getByRole("link", { name: pressName }).first().click();
  await page.waitForURL(/\/presses\/[a-z2-7]{24}$/);
  await page.locator("#inspections").getByLabel("Checklist").selectOption({ label: checklist });
  await page.locator("#inspections").getByRole("button", { name: "Start inspection" }).click();
  await page.waitForURL(/\/inspections\/[a-z2-7]{24}\/run$/);
  // The page streams in after its loading state: wait for the checklist itself.
  await page.getByRole("button", { name: "Sign this inspection" }).waitFor();
  return /\/inspections\/([a-z2-7]{24})\/run$/.exec(page.url())![1]!;
}

const item = (page: Page, key: string) => page.getByTestId(`item-${key}`);
/** The item's note (online, the photo picker beside it has a caption box too). */
const note = (page: Page, key: string) => item(page, key).getByRole("textbox", { name: /^(What is wrong|Note)/ });
async function answer(page: Page, key: string, outcome: "Pass" | "Fail" | "N/A", text?: string): Promise<void> {
  await item(page, key).getByRole("button", { name: outcome, exact: true }).click();
  if (text) await note(page, key).fill(text);
}
/** Waits until nothing is queued in the browser (every "not yet sent" mark gone). */
async function allSaved(page: Page): Promise<void> {
  await expect.poll(() => page.getByTestId("unsent").count(), { timeout: 20_000 }).toBe(0);
  await page.getByTestId("sync-state").filter({ hasText: "Every answer is saved on the server." }).waitFor();
}
/** Answers while online and waits for the server to confirm it. */
async function answerOnline(page: Page, key: string, outcome: "Pass" | "Fail" | "N/A"): Promise<void> {
  const confirmed = page.waitForResponse((r) => r.request().method() === "PATCH" && r.url().includes("/api/inspections/") && r.ok());
  await answer(page, key, outcome);
  await confirmed;
}

const MONTHLY_KEYS = ["relief", "rod", "hose-restraint", "bolts", "welds", "die-holders", "stop", "cable"];

describe("inspections", () => {
  it("an inspector runs the monthly checklist on a phone, fails a critical item, signs; the press is tagged out and the print view shows the signature", async () => {
    const { context, page } = await newPage(browser, 390, 844);
    await signIn(page, "ravi@millrace-forge.example");
    // The demo press's earlier signed inspections check out against the chain.
    await page.goto("/presses");
    await page.getByRole("link", { name: "Bay 1 H-frame" }).first().click();
    await expect.poll(() => page.getByTestId("chain-status").textContent()).toContain("Record intact");

    const id = await startFromPress(page, "Bay 1 H-frame", "Monthly inspection (Monthly)");
    expect(await page.getByTestId("lockout-reminder").count()).toBeGreaterThan(0);
    for (const key of MONTHLY_KEYS) if (key !== "bolts") await answer(page, key, key === "die-holders" ? "N/A" : "Pass");
    await answer(page, "bolts", "Fail", "Two tie-rod nuts turned by hand");
    await allSaved(page);
    await expect.poll(() => page.getByText(`${MONTHLY_KEYS.length} of ${MONTHLY_KEYS.length} answered`).count()).toBe(1);
    await screenshot(page, "inspection-run-390");
    await page.getByRole("button", { name: "Sign this inspection" }).click();
    await page.waitForURL(`**/inspections/${id}`);
    expect(await page.getByTestId("signature").textContent()).toContain("Ravi Lindqvist");
    // The page must not scroll sideways on a phone.
    expect(await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth)).toBeLessThanOrEqual(0);

    await page.getByRole("link", { name: "Bay 1 H-frame" }).click();
    await page.waitForURL(/\/presses\/[a-z2-7]{24}$/);
    const pressUrl = page.url();
    const panel = await page.getByTestId("tag-out-panel").textContent();
    expect(panel).toContain("Tagged out");
    expect(panel).toContain("Bolts and tie-rod nuts tight");
    await screenshot(page, "press-tagged-out-390");

    await page.goto(`/inspections/${id}/print`);
    const signature = await page.getByTestId("signature").textContent();
    expect(signature).toContain("Ravi Lindqvist");
    expect(signature).toMatch(/[0-9a-f]{64}/);
    expect(await page.getByTestId("inspection-record").textContent()).toContain("Two tie-rod nuts turned by hand");
    await page.emulateMedia({ media: "print" });
    await screenshot(page, "inspection-print");
    await page.emulateMedia({ media: "screen" });

    // The nuts are re-torqued: the inspector clears the tag-out with a recorded reason.
    await page.goto(pressUrl);
    const tagOuts = page.getByTestId("tag-out-panel");
    await tagOuts.getByLabel("Why it is safe again").fill("Tie-rod nuts re-torqued to spec and checked");
    await tagOuts.getByRole("button", { name: "Clear tag-out" }).click();
    await expect.poll(() => tagOuts.textContent()).toContain("Not tagged out.");
    expect(await tagOuts.textContent()).toContain("Tie-rod nuts re-torqued to spec and checked");
    await context.close();
  });

  it("keeps answers given without signal across a reload, sends each once when back online, then signs", async () => {
    const { context, page } = await newPage(browser, 390, 844);
    await signIn(page, "ravi@millrace-forge.example");
    const id = await startFromPress(page, "Bench C-frame", "Monthly inspection (Monthly)");
    // The run page registers its service worker (scope /inspections/) and keeps a copy of itself for
    // offline reloads. This page was opened by a redirect from the press page, so the worker serves
    // its next load rather than this one: wait until it is active.
    const workerReady = () =>
      page.evaluate(async () => (await navigator.serviceWorker.getRegistration("/inspections/"))?.active?.state === "activated" && Boolean(await caches.match(location.pathname)));
    await expect.poll(workerReady, { timeout: 45_000 }).toBe(true);
    await answerOnline(page, "relief", "Pass");

    await context.setOffline(true);
    await expect.poll(() => page.getByTestId("connection").textContent()).toBe("No connection");
    await answer(page, "rod", "Pass");
    await answer(page, "hose-restraint", "N/A");
    await answer(page, "bolts", "Fail", "One nut loose on the rear left tie rod");
    await expect.poll(() => page.getByTestId("sync-state").textContent()).toContain("3 answers not yet sent");
    expect(await page.getByTestId("unsent").count()).toBe(3);
    expect(await page.getByRole("button", { name: "Sign this inspection" }).isDisabled()).toBe(true);
    expect(await page.getByText("Signing needs a connection").count()).toBe(1);

    await page.reload();
    await expect.poll(() => page.getByTestId("sync-state").textContent()).toContain("3 answers not yet sent");
    expect(await page.getByTestId("unsent").count()).toBe(3);
    expect(await note(page, "bolts").inputValue()).toBe("One nut loose on the rear left tie rod");
    // The answer the server took before the signal went is shown too, though the offline copy predates it.
    expect(await item(page, "relief").getByRole("button", { name: "Pass", exact: true }).getAttribute("aria-pressed")).toBe("true");
    await expect.poll(() => page.getByText("4 of 8 answered").count()).toBe(1);
    await screenshot(page, "inspection-offline-390");
    // The worker keeps run pages and static assets only: no API answers, no other signed-in page.
    const cached = await page.evaluate(async () => {
      const paths: string[] = [];
      for (const name of await caches.keys()) for (const req of await (await caches.open(name)).keys()) paths.push(new URL(req.url).pathname);
      return paths;
    });
    expect(cached).toContain(`/inspections/${id}/run`);
    expect(cached.filter((p) => !/^\/(_next\/static\/|fonts\/|icon\.svg$|inspections\/[a-z2-7]{24}\/run$)/.test(p))).toEqual([]);

    const db = drizzle(pool);
    const before = await db.select().from(inspectionAnswerOps).where(eq(inspectionAnswerOps.inspectionId, id));
    expect(before).toHaveLength(1);

    await context.setOffline(false);
    await allSaved(page);
    const ops = await db.select().from(inspectionAnswerOps).where(eq(inspectionAnswerOps.inspectionId, id));
    expect(ops.map((o) => o.itemKey).sort()).toEqual(["bolts", "hose-restraint", "relief", "rod"]);
    const answered = await db
      .select({ itemKey: inspectionAnswers.itemKey, outcome: inspectionAnswers.outcome, note: inspectionAnswers.note })
      .from(inspectionAnswers)
      .where(and(eq(inspectionAnswers.inspectionId, id), isNotNull(inspectionAnswers.outcome)));
    expect(Object.fromEntries(answered.map((a) => [a.itemKey, a.outcome]))).toEqual({ relief: "pass", rod: "pass", "hose-restraint": "na", bolts: "fail" });
    expect(answered.find((a) => a.itemKey === "bolts")?.note).toBe("One nut loose on the rear left tie rod");

    for (const key of ["welds", "die-holders", "stop", "cable"]) await answerOnline(page, key, "Pass");
    await allSaved(page);
    await page.getByRole("button", { name: "Sign this inspection" }).click();
    await page.waitForURL(`**/inspections/${id}`);
    expect(await page.getByTestId("signature").textContent()).toContain("Ravi Lindqvist");
    await context.close();
  });
});
