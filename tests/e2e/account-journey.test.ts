import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser, newPage, signIn } from "./browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser.close();
});

describe("a new builder's account", () => {
  it("signs up, signs in on the page sign-up leads to, lands on the new personal shop, signs out and in again", async () => {
    const { context, page } = await newPage(browser);
    const email = `builder-${Date.now()}@test.example`;
    const password = "mild steel and patience";

    await page.goto("/");
    await page.getByRole("link", { name: "Create a free account" }).click();
    await page.waitForURL("**/sign-up");
    await page.getByLabel("Your name").fill("Morgan Ash");
    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel("Password").fill(password);
    await page.getByRole("button", { name: "Create account" }).click();
    // Sign-up answers the same for a new and a taken address (no enumeration): sign in next.
    await page.waitForURL("**/sign-in?signed-up=1");
    await expect(page.getByText("If this address is new to Presswright, your account is ready").waitFor()).resolves.toBeUndefined();
    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel("Password").fill(password);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL("**/dashboard");
    await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toBe("Morgan Ash's shop");
    await expect(page.getByTestId("active-shop").first().textContent()).resolves.toBe("Morgan Ash's shop");

    await page.locator("summary:visible", { hasText: "Account menu" }).click();
    await page.getByRole("button", { name: "Sign out" }).click();
    await page.waitForURL("**/sign-in");
    await page.goto("/dashboard");
    await page.waitForURL("**/sign-in?next=%2Fdashboard");

    await signIn(page, email, password);
    await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toBe("Morgan Ash's shop");
    await context.close();
  });

  it("shows field-level errors and keeps what was typed, except the password", async () => {
    const { context, page } = await newPage(browser, 390, 844);
    await page.goto("/sign-up");
    await page.getByLabel("Your name").fill("Sam");
    await page.getByLabel("E-mail").fill("not-an-email");
    await page.getByLabel("Password").fill("password123");
    await page.getByRole("button", { name: "Create account" }).click();
    await expect(page.getByText("Enter a valid e-mail address").waitFor()).resolves.toBeUndefined();
    await expect(page.getByText("commonly used passwords").waitFor()).resolves.toBeUndefined();
    expect(await page.getByLabel("Your name").inputValue()).toBe("Sam");
    expect(await page.getByLabel("Password").inputValue()).toBe("");

    await context.close();
  });

  it("answers a taken address exactly as a new one", async () => {
    const answers: string[] = [];
    for (const email of ["dana@millrace-forge.example", `nobody-${Date.now()}@test.example`]) {
      const { context, page } = await newPage(browser, 390, 844);
      await page.goto("/sign-up");
      await page.getByLabel("Your name").fill("Sam");
      await page.getByLabel("E-mail").fill(email);
      await page.getByLabel("Password").fill("a perfectly fine passphrase");
      await page.getByRole("button", { name: "Create account" }).click();
      await page.waitForURL("**/sign-in?signed-up=1");
      answers.push(await page.getByRole("main").innerText());
      const cookies = await context.cookies();
      expect(cookies.some((c) => c.name.includes("session"))).toBe(false);
      await context.close();
    }
    expect(answers[0]).toBe(answers[1]);
    expect(answers[0]).not.toMatch(/already exists/);
  });

  it("answers a wrong password without saying whether the account exists", async () => {
    const { context, page } = await newPage(browser);
    await page.goto("/sign-in");
    await page.getByLabel("E-mail").fill("nobody@nowhere.example");
    await page.getByLabel("Password").fill("whatever it is");
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect(page.getByText("That e-mail and password do not match an account.").waitFor()).resolves.toBeUndefined();
    await context.close();
  });
});
