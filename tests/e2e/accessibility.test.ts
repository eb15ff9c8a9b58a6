// axe-core on every page at 390 and 1280 px: 0 serious or critical violations (issue 13, item 9).
// The pages come from app/**/page.tsx (tests/e2e/page-urls.ts), so a new page is checked without
// being listed. Shop pages are visited as the demo manager with every panel opened, public pages
// signed out and signed in; then the states that matter beyond a page load: the header menus, an
// inspection run, forms showing their validation errors. The photo viewer dialog is checked in
// photos.test.ts, where a photo exists. Each file prints its counts per rule.
import { eq } from "drizzle-orm";
import { drizzle } from "drizzle-orm/mysql2";
import mysql from "mysql2/promise";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { appDatabaseUrl } from "@/db/config";
import { inspectionAnswers, inspections } from "@/db/schema";
import { pageFiles } from "../app-files";
import { axeAtEachWidth, describeFindings, isFailing, openDisclosures, summarize, type Finding } from "./axe";
import { launchBrowser, newPage, signIn } from "./browser";
import { demoEmail, isPublic, NOT_FOUND_URL, resolveIds, signInCookie, urlOf, type SegmentIds } from "./page-urls";

let browser: Browser;
let ids: SegmentIds;
const contexts: BrowserContext[] = [];
const pages: Record<"signedOut" | "manager" | "inspector", Page> = {} as never;
const all: Finding[] = [];

async function openPage(who: "manager" | "inspector" | null): Promise<Page> {
  const { context, page } = await newPage(browser);
  contexts.push(context);
  if (who) await signIn(page, demoEmail(who));
  return page;
}

beforeAll(async () => {
  browser = await launchBrowser();
  ids = await resolveIds(await signInCookie());
  pages.signedOut = await openPage(null);
  pages.manager = await openPage("manager");
  pages.inspector = await openPage("inspector");
}, 120_000);

afterAll(async () => {
  console.info(`[a11y] axe findings per rule (every impact):\n${summarize(all)}`);
  const rest = all.filter((f) => !isFailing(f));
  if (rest.length) console.info(`[a11y] moderate and minor findings:\n${describeFindings(rest).join("\n")}`);
  await browser.close();
});

/** Checks the page state at both widths; fails on serious or critical findings. */
async function check(page: Page, where: string, prepare: (page: Page) => Promise<void>): Promise<void> {
  const found = await axeAtEachWidth(page, where, prepare);
  all.push(...found);
  expect(describeFindings(found.filter(isFailing))).toEqual([]);
}

const visit = (url: string) => async (page: Page) => {
  await page.goto(url);
  // A page may redirect after it streams (a signed inspection's run page → its record): settle first.
  await page.waitForLoadState("networkidle");
  await openDisclosures(page);
};

describe("accessibility of every page (axe-core, 390 and 1280 px)", () => {
  it.each(pageFiles())("%s", async (file) => {
    const url = urlOf(file, ids);
    if (isPublic(file)) await check(pages.signedOut, `${url} (signed out)`, visit(url));
    await check(pages.manager, `${url} (manager)`, visit(url));
  });

  it("the 404 page", async () => {
    await check(pages.signedOut, `${NOT_FOUND_URL} (signed out)`, visit(NOT_FOUND_URL));
    await check(pages.manager, `${NOT_FOUND_URL} (manager)`, visit(NOT_FOUND_URL));
  });
});

describe("accessibility of interactive states", () => {
  it("the header's account and shop menus, open", async () => {
    await check(pages.manager, "/dashboard with the header menus open", async (page) => {
      await page.goto("/dashboard");
      await page.evaluate(() => document.querySelectorAll("header details").forEach((d) => ((d as HTMLDetailsElement).open = true)));
    });
  });

  it("an inspection run on the inspector's phone, with a failed item asking for its note", async () => {
    const page = pages.inspector;
    await page.goto(`/presses/${ids.pressId}`);
    await page.locator("#inspections").getByLabel("Checklist").selectOption({ index: 1 });
    await page.locator("#inspections").getByRole("button", { name: "Start inspection" }).click();
    await page.waitForURL(/\/inspections\/[a-z2-7]{24}\/run$/);
    const runUrl = new URL(page.url()).pathname;
    const inspectionId = runUrl.split("/")[2]!;
    try {
      await check(page, `${runUrl} (inspector)`, async () => {
        await page.goto(runUrl);
        const first = page.locator("[data-testid^='item-']").first();
        const fail = first.getByRole("button", { name: "Fail", exact: true });
        if ((await fail.getAttribute("aria-pressed")) !== "true") await fail.click();
        await first.getByRole("textbox", { name: /^What is wrong/ }).waitFor();
      });
    } finally {
      // Leave the shared database as it was: this run was only opened to be looked at.
      const pool = mysql.createPool({ uri: appDatabaseUrl(), timezone: "Z", connectionLimit: 1 });
      const db = drizzle(pool);
      await db.delete(inspectionAnswers).where(eq(inspectionAnswers.inspectionId, inspectionId));
      await db.delete(inspections).where(eq(inspections.id, inspectionId));
      await pool.end();
    }
  });

  /** Submits the form empty (forms set noValidate, so the server answers) and waits for its errors. */
  const submitEmpty = (url: string, button: string) => async (page: Page) => {
    await page.goto(url);
    await page.getByRole("button", { name: button }).click();
    await page.locator("[aria-invalid='true']").first().waitFor();
  };

  it.each([
    ["signedOut", "/sign-in", "Sign in"],
    ["signedOut", "/sign-up", "Create account"],
    ["manager", "/presses/new", "Create press"],
  ] as const)("%s: %s with its validation errors shown", async (who, url, button) => {
    await check(pages[who], `${url} with errors (${who})`, submitEmpty(url, button));
  });
});
