// The account-less public pages are prerendered and carry a hash-based CSP (proxy.ts,
// lib/csp/): the policy allows 'self' and exactly the page's inline scripts, and the pages work
// in Chromium without one CSP violation. Who is signed in is filled in on the client
// (/api/session), and sign-in reads ?next= in the browser while the action still checks it.
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_PASSWORD, DEMO_USERS } from "@/db/demo-data";
import { BASE_URL, launchBrowser, newPage, signIn } from "./browser";

const PRERENDERED = ["/", "/sizing", "/sizing/gauge-card?bore=125&count=2&relief=210&units=metric&name=Shop+press", "/sign-in", "/sign-up", "/forgot-password"];
const manager = DEMO_USERS.find((u) => u.key === "manager")!;

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser.close();
});

/** Every CSP violation the page reports, from the DOM event and from the console. */
async function watchViolations(page: Page): Promise<string[]> {
  const seen: string[] = [];
  await page.exposeFunction("reportCspViolation", (text: string) => seen.push(text));
  await page.addInitScript(() => {
    document.addEventListener("securitypolicyviolation", (e) => {
      (window as unknown as { reportCspViolation: (t: string) => void }).reportCspViolation(`${e.violatedDirective}: ${e.blockedURI || "inline"} ${e.sample}`);
    });
  });
  page.on("console", (message) => {
    if (/Content Security Policy|Refused to (execute|load)/i.test(message.text())) seen.push(`console: ${message.text()}`);
  });
  return seen;
}

/** Signs in on a sign-in page opened at `url`, once the page has hydrated (it asked /api/session). */
async function signInVia(page: Page, url: string): Promise<void> {
  const hydrated = page.waitForResponse((r) => r.url().endsWith("/api/session"));
  await page.goto(url);
  await hydrated;
  await page.getByLabel("E-mail").fill(manager.email);
  await page.getByLabel("Password").fill(DEMO_PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
}

describe("prerendered public pages", () => {
  it("are served with a hash-based policy: no nonce, no 'unsafe-inline', the same HTML twice", async () => {
    for (const url of PRERENDERED) {
      const [first, second] = await Promise.all([fetch(`${BASE_URL}${url}`), fetch(`${BASE_URL}${url}`)]);
      expect(first.status, url).toBe(200);
      const scriptSrc = (first.headers.get("content-security-policy") ?? "").split(";").map((d) => d.trim()).find((d) => d.startsWith("script-src ")) ?? "";
      expect(scriptSrc, url).toMatch(/^script-src 'self'( 'sha256-[A-Za-z0-9+/=]+')+$/);
      // Rendered once at build time, so two requests get byte-identical pages.
      expect(await first.text(), url).toBe(await second.text());
    }
  });

  it("work in Chromium without a CSP violation, signed out and signed in", async () => {
    const { context, page } = await newPage(browser);
    const violations = await watchViolations(page);
    for (const url of PRERENDERED) {
      const session = page.waitForResponse((r) => r.url().endsWith("/api/session"));
      await page.goto(url);
      expect((await session).status(), url).toBe(200); // the header's script ran: the page hydrated
    }
    // The calculator answers typing (its scripts run) and its plots load after first paint.
    await page.goto("/sizing");
    await page.getByLabel("Bore (mm)").fill("140");
    await page.getByText("Loading the plots…").waitFor({ state: "detached" });
    await page.goto(PRERENDERED[2]!);
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe("Shop press");

    await signIn(page, manager.email);
    for (const url of ["/sizing", "/forgot-password", PRERENDERED[2]!]) {
      await page.goto(url);
      await page.getByTestId("active-shop").first().waitFor();
    }
    expect(violations).toEqual([]);
    await context.close();
  });
});

describe("the public header and sign-in on prerendered pages", () => {
  it("shows the signed-in header on a public page after sign-in, and the sign-in links after sign-out", async () => {
    const { context, page } = await newPage(browser);
    await page.goto("/sizing");
    await page.getByRole("navigation", { name: "Public" }).getByRole("link", { name: "Sign in" }).waitFor();
    await signInVia(page, "/sign-in?next=%2Fsizing");
    await page.waitForURL("**/sizing");
    await page.locator("summary:visible", { hasText: "Account menu" }).waitFor();
    expect((await page.getByTestId("active-shop").first().textContent())?.length).toBeGreaterThan(0);
    expect(await page.getByRole("navigation", { name: "Public" }).count()).toBe(0);

    await page.locator("summary:visible", { hasText: "Account menu" }).click();
    await page.getByRole("button", { name: "Sign out" }).click();
    await page.waitForURL("**/sign-in");
    await page.getByRole("navigation", { name: "Public" }).waitFor();
    expect(await page.locator("summary", { hasText: "Account menu" }).count()).toBe(0);
    await context.close();
  });

  it("follows ?next= on this site and refuses one that leaves it", async () => {
    for (const [next, landing] of [
      ["/presses?view=all", /\/presses\?view=all$/],
      ["https://evil.example/", /\/dashboard$/],
      ["//evil.example/", /\/dashboard$/],
      ["/\\evil.example", /\/dashboard$/],
    ] as const) {
      const { context, page } = await newPage(browser);
      await signInVia(page, `/sign-in?next=${encodeURIComponent(next)}`);
      await page.waitForURL(landing);
      expect(new URL(page.url()).origin, next).toBe(BASE_URL);
      await context.close();
    }
  });

  it("sends a visitor who is already signed in on from the landing and sign-in pages", async () => {
    const { context, page } = await newPage(browser);
    await signIn(page, manager.email);
    await page.goto("/");
    await page.waitForURL("**/dashboard");
    await page.goto("/sign-in?next=%2Fbookings");
    await page.waitForURL("**/bookings");
    await page.goto("/sign-in?next=https%3A%2F%2Fevil.example%2F");
    await page.waitForURL("**/dashboard");
    await context.close();
  });
});
