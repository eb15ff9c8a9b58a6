// Hardening, in the browser: #1 no redirect off the site after sign-in, whatever `next` holds;
// #8 a photo link copied out of a signed-in page works only for members of the photo's shop and
// stops working at its expiry (the test server runs with PHOTO_URL_TTL_S=20, see scripts/test.sh);
// #5 a forged shop switch and a malformed percent-escape are 404/400, never 500.
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { noisyJpeg } from "../fixtures/images";
import { BASE_URL, launchBrowser, newPage, signIn } from "./browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser.close();
});

const ORIGIN = new URL(BASE_URL).origin;

/** `next` values as an attacker would put them in the query string (already percent-encoded). */
const HOSTILE_NEXT = [
  "/%5Cevil.example/x", // backslash: browsers read "/\" as "//"
  "/%09/evil.example", // a tab after the first slash is dropped by the URL parser
  "/%0A/evil.example",
  "/%0D%0A/evil.example",
  "//evil.example",
  "/%2F/evil.example",
  "/%5C%5Cevil.example",
  "%5C%5Cevil.example",
  "https://evil.example/",
  "https:evil.example",
  "javascript:alert(document.domain)",
  "/%00/evil.example",
  "/.%5Cevil.example",
  "%2F%2Fevil.example",
];

async function signInWithNext(page: Page, next: string): Promise<string> {
  await page.goto(`/sign-in?next=${next}`);
  await page.getByLabel("E-mail").fill("tess@millrace-forge.example");
  await page.getByLabel("Password").fill("anvil-quench-2026");
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"), { timeout: 15_000 }).catch(() => undefined);
  await page.waitForLoadState("load");
  return page.url();
}

describe("after sign-in, `next` never leads off the site (#1)", () => {
  it.each(HOSTILE_NEXT)("next=%s lands on our own dashboard", async (next) => {
    const { context, page } = await newPage(browser);
    const landed = await signInWithNext(page, next);
    expect(new URL(landed).origin).toBe(ORIGIN);
    expect(new URL(landed).pathname).toBe("/dashboard");
    // Already signed in, the sign-in page follows `next` too: the same check applies.
    await page.goto(`/sign-in?next=${next}`);
    await page.waitForLoadState("load");
    expect(new URL(page.url()).origin).toBe(ORIGIN);
    await context.close();
  });

  it("follows an odd path only on our own origin", async () => {
    const { context, page } = await newPage(browser);
    // U+2028 is not stripped by the URL parser: this is a (missing) page of ours, not another host.
    const landed = await signInWithNext(page, "/%E2%80%A8/evil.example");
    expect(new URL(landed).origin).toBe(ORIGIN);
    await context.close();
  });

  it("still follows a path on the site, with its query", async () => {
    const { context, page } = await newPage(browser);
    const landed = await signInWithNext(page, encodeURIComponent("/presses?from=test"));
    expect(landed).toBe(`${ORIGIN}/presses?from=test`);
    await context.close();
  });
});

describe("photo links (#8)", () => {
  it("work for members only and stop working at their expiry", async () => {
    const caption = `Cracked weld ${Date.now().toString(36)}`;
    const { context, page } = await newPage(browser);
    await signIn(page, "tess@millrace-forge.example");
    await page.goto("/presses");
    await page.getByRole("link", { name: "Bay 1 H-frame" }).click();
    await page.waitForURL(/\/presses\/[a-z2-7]{24}$/);
    const uploader = page.getByRole("region", { name: "Add photos" });
    await uploader.getByLabel("Shows").selectOption("damage");
    await uploader.getByLabel("Caption (optional)").fill(caption);
    await page.getByLabel("Choose photos").setInputFiles({ name: "crack.jpg", mimeType: "image/jpeg", buffer: await noisyJpeg(800, 600) });
    await uploader.getByRole("button", { name: "Upload photo" }).click();
    await page.getByText("1 photo added.").waitFor({ timeout: 30_000 });
    const thumb = page.getByTestId("photo-gallery").getByAltText(caption);
    await thumb.waitFor();
    await page.waitForFunction((el) => el instanceof HTMLImageElement && el.complete && el.naturalWidth > 0, await thumb.elementHandle(), { timeout: 15_000 });

    // The link as a user would copy it out of the page.
    const copied = new URL((await thumb.getAttribute("src"))!, ORIGIN).href;
    expect(copied).toMatch(/\/photo-files\/[a-z2-7]{24}\/thumb\?exp=\d+&sig=/);
    expect((await page.request.get(copied)).status()).toBe(200);

    const anonymous = await newPage(browser);
    expect((await anonymous.page.request.get(copied)).status()).toBe(401);
    await anonymous.context.close();

    const otherShop = await newPage(browser);
    await signIn(otherShop.page, "lena@garage-build.example");
    expect((await otherShop.page.request.get(copied)).status()).toBe(404);
    expect((await otherShop.page.request.get(copied.replace("/thumb?", "/full?"))).status()).toBe(403);

    // Wait out the link's lifetime (20 s on the test server, rounded up to a quarter of it).
    const exp = Number(new URL(copied).searchParams.get("exp"));
    const waitMs = exp * 1000 - Date.now() + 1500;
    expect(waitMs, "start the test server with PHOTO_URL_TTL_S=20 (scripts/test.sh does)").toBeLessThan(40_000);
    await page.waitForTimeout(Math.max(0, waitMs));
    const expired = await page.request.get(copied);
    expect(expired.status()).toBe(410);
    expect((await otherShop.page.request.get(copied)).status()).not.toBe(200);
    await otherShop.context.close();

    // The page itself keeps working: a reload hands out fresh links.
    await page.reload();
    const fresh = page.getByTestId("photo-gallery").getByAltText(caption);
    await fresh.waitFor();
    const freshSrc = new URL((await fresh.getAttribute("src"))!, ORIGIN).href;
    expect(freshSrc).not.toBe(copied);
    expect((await page.request.get(freshSrc)).status()).toBe(200);
    await context.close();
  }, 120_000);
});

describe("crafted requests never answer 500 (#5)", () => {
  it("a malformed percent-escape in an API path is a 400", async () => {
    const { context, page } = await newPage(browser);
    await signIn(page, "tess@millrace-forge.example");
    for (const path of ["/api/presses/%ff", "/api/presses/%E0%A4%A", "/api/photos/%c0"]) {
      const res = await page.request.get(path);
      expect(res.status(), path).toBe(400);
    }
    await context.close();
  });

  it("switching to another shop's id is a 404, not a server error", async () => {
    const lena = await newPage(browser);
    await signIn(lena.page, "lena@garage-build.example");
    const { shops } = (await (await lena.page.request.get("/api/me")).json()) as { shops: { id: string }[] };
    await lena.context.close();

    const { context, page } = await newPage(browser);
    await signIn(page, "tess@millrace-forge.example");
    await page.locator("summary:has([data-testid=active-shop]):visible").click();
    const form = page.locator('form:has(input[name="shopId"]):visible').first();
    await form.locator('input[name="shopId"]').evaluate((input, id) => ((input as HTMLInputElement).value = id), shops[0]!.id);
    const [response] = await Promise.all([page.waitForResponse((r) => r.request().method() === "POST"), form.locator("button").click()]);
    expect(response.status()).toBe(404);
    await page.getByRole("heading", { name: "Nothing here" }).waitFor();
    await context.close();
  });
});
