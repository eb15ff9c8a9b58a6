import { eq } from "drizzle-orm";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { WORKSHOP } from "@/db/demo-data";
import { emailOutbox } from "@/db/schema";
import { localDate, startOfLocalDay } from "@/lib/time-zone";
import { waitForMessage } from "../integration/mail";
import { launchBrowser, newPage, screenshot, signIn } from "./browser";

let browser: Browser;
/** The press's status before the stop-use report (the second test expects it back). */
let initialStatus = "";
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser.close();
  await pool.end();
});

/** A member finds the status-page link on the press's QR card page. */
async function statusLink(page: Page, pressName: string): Promise<string> {
  await page.goto("/dashboard");
  await page.getByRole("link", { name: new RegExp(pressName) }).first().click();
  await page.getByRole("link", { name: "Status page and QR card" }).click();
  const link = (await page.getByTestId("status-link").textContent())!.trim();
  expect(link).toMatch(/\/status\/[a-z2-7]{24}$/);
  return new URL(link).pathname;
}

describe("shared shop: status page, booking, stop-use report", () => {
  it("books from the status page on a phone, then a stop-use report tags the press out and refuses new bookings", async () => {
    const tess = await newPage(browser, 390, 844);
    await signIn(tess.page, "tess@millrace-forge.example");
    const statusPath = await statusLink(tess.page, "Bay 1 H-frame");
    await screenshot(tess.page, "shared-shop-qr-card-phone");

    await tess.page.goto(statusPath);
    await tess.page.getByRole("heading", { level: 1, name: "Bay 1 H-frame" }).waitFor();
    // Whatever the demo's service and inspection dates make of it, the press is usable: not tagged out.
    initialStatus = (await tess.page.locator("[data-status]").first().getAttribute("data-status")) ?? "";
    expect(["ready", "service-due", "inspection-overdue"]).toContain(initialStatus);
    await tess.page.getByTestId("free-slots").waitFor();
    await screenshot(tess.page, "shared-shop-status-ready-phone");

    // Six days ahead at 07:00–08:00 shop time: free in the demo scenario.
    const day = localDate(startOfLocalDay(new Date(), WORKSHOP.timeZone, 6), WORKSHOP.timeZone);
    const form = tess.page.getByTestId("booking-form");
    await form.getByLabel("Date").fill(day);
    await form.getByLabel("From").fill("07:00");
    await form.getByLabel("To").fill("08:00");
    const bookedAt = Date.now() - 1000;
    await form.getByRole("button", { name: "Book" }).click();
    await expect(form.getByRole("status").textContent()).resolves.toContain(`Booked ${day} 07:00–08:00`);

    // The confirmation arrives at the local SMTP fake, delivered by the app's outbox sender.
    const mail = await waitForMessage(
      "tess@millrace-forge.example",
      (m) => Date.parse(m.receivedAt) >= bookedAt && m.subject.startsWith("Booked: Bay 1 H-frame"),
    );
    expect(mail.text).toContain(WORKSHOP.name);
    const ics = mail.attachments?.find((a) => a.filename === "booking.ics");
    expect(ics?.contentType).toContain("text/calendar");
    expect(ics?.content).toMatch(/BEGIN:VCALENDAR[\s\S]*DTSTART:/);

    // Another member reports a stop-use problem from the same status page.
    const owen = await newPage(browser, 390, 844);
    await signIn(owen.page, "owen@millrace-forge.example");
    await owen.page.goto(statusPath);
    const problem = owen.page.getByTestId("problem-form");
    await problem.getByLabel("What is wrong?").fill("Pressure hose bulging near the valve block");
    await problem.getByLabel("How serious").selectOption("high");
    await problem.getByLabel(/Stop use/).check();
    await problem.getByRole("button", { name: "Report problem" }).click();
    await expect(problem.getByRole("status").textContent()).resolves.toContain("tagged out");
    // A photo may follow, attached to the new report.
    await owen.page.getByRole("heading", { name: "Add a photo of it (optional)" }).waitFor();
    await expect(owen.page.locator("[data-status]").first().getAttribute("data-status")).resolves.toBe("tagged-out");
    await screenshot(owen.page, "shared-shop-problem-reported-phone");
    await owen.context.close();

    await tess.page.reload();
    const badge = tess.page.locator("[data-status]").first();
    await expect(badge.getAttribute("data-status")).resolves.toBe("tagged-out");
    await expect(tess.page.getByTestId("live-status").textContent()).resolves.toContain("Stop-use problem reported: Pressure hose bulging near the valve block");
    await expect(tess.page.getByTestId("booking-form").count()).resolves.toBe(0);
    await screenshot(tess.page, "shared-shop-status-tagged-out-phone");

    // A new booking is refused with the reason.
    await tess.page.goto("/bookings?press=");
    const bookings = tess.page.getByTestId("booking-form");
    await bookings.getByLabel("Press").selectOption({ label: "Bay 1 H-frame" });
    await bookings.getByLabel("Date").fill(day);
    await bookings.getByLabel("From").fill("09:00");
    await bookings.getByLabel("To").fill("10:00");
    await bookings.getByRole("button", { name: "Book" }).click();
    const refusal = bookings.getByRole("alert");
    await expect(refusal.textContent()).resolves.toContain("Stop-use problem reported: Pressure hose bulging near the valve block");
    await screenshot(tess.page, "shared-shop-booking-refused-phone");
    await tess.context.close();

    // The managers were told, and so were holders of future bookings of the press.
    const alerts = await db.select({ to: emailOutbox.toAddress, kind: emailOutbox.kind }).from(emailOutbox).where(eq(emailOutbox.kind, "problem-report"));
    expect(alerts.map((a) => a.to)).toContain("dana@millrace-forge.example");
    const notices = await db.select({ to: emailOutbox.toAddress }).from(emailOutbox).where(eq(emailOutbox.kind, "tag-out-alert"));
    expect(notices.map((n) => n.to)).toEqual(expect.arrayContaining(["tess@millrace-forge.example", "owen@millrace-forge.example"]));
  });

  it("lets the manager close the report, which puts the press back to its status before the report", async () => {
    const dana = await newPage(browser);
    await signIn(dana.page, "dana@millrace-forge.example");
    await dana.page.goto("/dashboard");
    await dana.page.getByRole("link", { name: /Bay 1 H-frame/ }).first().click();
    await expect(dana.page.getByTestId("press-status").locator("[data-status]").getAttribute("data-status")).resolves.toBe("tagged-out");
    await screenshot(dana.page, "shared-shop-press-tagged-out");
    await dana.page.getByLabel("How was it dealt with?").fill("Hose replaced with a new 2-wire assembly, tested at working pressure");
    await dana.page.getByRole("button", { name: "Close report" }).click();
    // The closed report leaves the open list as the page re-renders.
    await dana.page.getByText("No open problem reports.").waitFor();
    await dana.page.reload();
    await expect(dana.page.getByTestId("press-status").locator("[data-status]").getAttribute("data-status")).resolves.toBe(initialStatus);
    await dana.page.goto("/bookings");
    await dana.page.getByTestId("week-view").waitFor();
    await screenshot(dana.page, "shared-shop-bookings");
    await dana.context.close();
  });
});
