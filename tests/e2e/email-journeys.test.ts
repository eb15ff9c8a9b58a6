import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser, newPage, screenshot, signIn } from "./browser";

// The app's own sender delivers to the SMTP fake that the test command runs; read it from its API.
const mailApi = `http://127.0.0.1:${Number(process.env.SMTP_API_PORT || Number(process.env.SMTP_PORT || 2525) + 1000)}`;

async function waitForLink(to: string, path: string): Promise<string> {
  for (let i = 0; i < 60; i++) {
    const res = await fetch(`${mailApi}/messages?to=${encodeURIComponent(to)}`);
    const { messages } = (await res.json()) as { messages: { text: string }[] };
    const m = messages.map((x) => new RegExp(`https?://\\S+(${path}/[a-z2-7]{24}\\.[a-z2-7]{52})`).exec(x.text)).find(Boolean);
    if (m) return m[1]!;
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error(`No ${path} message for ${to}`);
}

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser.close();
});

describe("e-mail journeys", () => {
  it("a manager invites a newcomer, who signs up from the e-mailed link and lands in the shop", async () => {
    const email = `newcomer-${Date.now()}@test.example`;
    const manager = await newPage(browser);
    await signIn(manager.page, "dana@millrace-forge.example");
    await manager.page.goto("/shop");
    await manager.page.getByLabel("E-mail address").fill(email);
    await manager.page.getByLabel("Role").selectOption("member");
    await manager.page.getByRole("button", { name: "Send invitation" }).click();
    await expect.poll(() => manager.page.getByTestId("pending-invitations").textContent()).toContain(email);
    await screenshot(manager.page, "shop-invitations");
    await manager.context.close();

    const path = await waitForLink(email, "/invite");
    const guest = await newPage(browser, 390, 844);
    await guest.page.goto(path);
    expect(await guest.page.getByRole("heading", { level: 1 }).textContent()).toBe("Join Millrace Community Forge");
    await guest.page.getByLabel("Your name").fill("Nia Forde");
    await guest.page.getByLabel("Choose a password").fill("bellows-and-hardy-hole");
    await guest.page.getByRole("button", { name: "Create my account and join" }).click();
    await guest.page.waitForURL("**/dashboard");
    expect(await guest.page.getByRole("heading", { level: 1 }).textContent()).toBe("Millrace Community Forge");
    // The link was single use.
    await guest.page.goto(path);
    await guest.page.getByText("already been used").waitFor();
    await guest.context.close();
  });

  it("a forgotten password is reset from the e-mailed link, once", async () => {
    const { context, page } = await newPage(browser);
    const email = `reset-${Date.now()}@test.example`;
    await page.goto("/sign-up");
    await page.getByLabel("Your name").fill("Remy Tong");
    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel("Password").fill("first-forge-weld-2026");
    await page.getByRole("button", { name: "Create account" }).click();
    // Sign-up answers alike for new and taken addresses: it never signs anyone in by itself.
    await page.waitForURL("**/sign-in?signed-up=1");

    await page.goto("/sign-in");
    await page.getByRole("link", { name: "Forgot your password?" }).click();
    await page.waitForURL("**/forgot-password");
    await page.getByLabel("E-mail").fill(email);
    await page.getByRole("button", { name: "Send me a link" }).click();
    await expect.poll(() => page.getByRole("status").textContent()).toContain("If an account uses this address");
    const path = await waitForLink(email, "/reset-password");
    await page.goto(path);
    await page.getByLabel("New password", { exact: true }).fill("second-forge-weld-2026");
    await page.getByLabel("New password again").fill("second-forge-weld-2026");
    await page.getByRole("button", { name: "Save the new password" }).click();
    await page.waitForURL("**/sign-in?reset=1");
    await signIn(page, email, "second-forge-weld-2026");
    await page.goto(path);
    await page.getByText("already been used").waitFor();
    await context.close();
  });

  it("has no dev outbox in a production build", async () => {
    const res = await fetch(`${process.env.E2E_BASE_URL ?? "http://127.0.0.1:3100"}/dev/outbox`);
    expect(res.status).toBe(404);
  });
});
