import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { BASE_URL, launchBrowser, newPage, screenshot, signIn } from "./browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser.close();
});

describe("roles in the demo workshop", () => {
  it("gives a member the 403 page on a manager-only page", async () => {
    const { context, page } = await newPage(browser, 390, 844);
    await signIn(page, "tess@millrace-forge.example");
    const response = await page.goto("/shop/settings");
    expect(response?.status()).toBe(403);
    await expect(page.getByRole("heading", { name: "Not for your role" }).waitFor()).resolves.toBeUndefined();
    await context.close();
  });

  it("lets the manager open shop settings", async () => {
    const { context, page } = await newPage(browser);
    await signIn(page, "dana@millrace-forge.example");
    const response = await page.goto("/shop/settings");
    expect(response?.status()).toBe(200);
    await expect(page.getByRole("heading", { name: "Shop settings" }).waitFor()).resolves.toBeUndefined();
    await context.close();
  });

  it("answers another shop's press with the 404 page and a 404 from the API", async () => {
    const manager = await newPage(browser);
    await signIn(manager.page, "dana@millrace-forge.example");
    const listed = (await (await manager.page.request.get("/api/presses")).json()) as { presses: { id: string; name: string }[] };
    const press = listed.presses.find((p) => p.name === "Bay 1 H-frame");
    expect(press).toBeDefined();
    await manager.context.close();

    const builder = await newPage(browser);
    await signIn(builder.page, "lena@garage-build.example");
    const page = await builder.page.goto(`/presses/${press!.id}`);
    expect(page?.status()).toBe(404);
    await expect(builder.page.getByRole("heading", { name: "Nothing here" }).waitFor()).resolves.toBeUndefined();
    const api = await builder.page.request.get(`/api/presses/${press!.id}`);
    expect(api.status()).toBe(404);
    await builder.context.close();
  });

  it("switches between shops", async () => {
    const { context, page } = await newPage(browser);
    await signIn(page, "ravi@millrace-forge.example");
    await page.locator("summary", { hasText: "Switch shop" }).click();
    await page.getByRole("button", { name: /Ravi Lindqvist's shop/ }).click();
    await page.getByRole("heading", { level: 1, name: "Ravi Lindqvist's shop" }).waitFor();
    // The choice is remembered for the next visit.
    await page.goto("/shop");
    await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toBe("Ravi Lindqvist's shop");
    // Switch back: the choice is stored on the account, and other journeys sign in as Ravi too.
    await page.locator("summary", { hasText: "Switch shop" }).click();
    await page.getByRole("button", { name: /Millrace Community Forge/ }).click();
    await page.getByRole("heading", { level: 1, name: "Millrace Community Forge" }).waitFor();
    await context.close();
  });
});

describe("pages look finished at desktop and phone width", () => {
  for (const [width, height] of [
    [1280, 800],
    [390, 844],
  ] as const) {
    it(`landing page and dashboard at ${width} px`, async () => {
      const { context, page } = await newPage(browser, width, height);
      await page.goto("/");
      await page.getByRole("heading", { level: 1 }).waitFor();
      await screenshot(page, `landing-${width}`);
      await signIn(page, "dana@millrace-forge.example");
      await page.getByRole("heading", { name: "Presses" }).waitFor();
      await screenshot(page, `dashboard-${width}`);
      // Nothing may overflow sideways at phone width.
      const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
      expect(overflow).toBeLessThanOrEqual(0);
      await context.close();
    });
  }
});

describe("response headers", () => {
  // The landing page is prerendered (hash-based policy); a per-token page is rendered per request (nonce).
  it.each([
    ["/", /script-src 'self'( 'sha256-[A-Za-z0-9+/=]+')*(;|$)/],
    ["/invite/aaaaaaaaaaaaaaaaaaaaaaaa", /script-src 'self' 'nonce-[A-Za-z0-9+/=]+' 'strict-dynamic'/],
  ])("sends %s a CSP without unsafe-inline script and hardening headers, without X-Powered-By", async (path, scriptSrc) => {
    const res = await fetch(`${BASE_URL}${path}`);
    const csp = res.headers.get("content-security-policy") ?? "";
    expect(csp).toMatch(scriptSrc);
    expect(csp).not.toMatch(/script-src[^;]*'unsafe-inline'/);
    expect(csp).toContain("object-src 'none'");
    expect(csp).toContain("base-uri 'none'");
    expect(csp).toContain("frame-ancestors 'none'");
    expect(res.headers.get("x-content-type-options")).toBe("nosniff");
    expect(res.headers.get("referrer-policy")).toBe("strict-origin-when-cross-origin");
    expect(res.headers.get("x-powered-by")).toBeNull();
  });
});
