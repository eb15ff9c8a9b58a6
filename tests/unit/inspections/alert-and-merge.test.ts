import { describe, expect, it } from "vitest";
import { newestAnswers } from "@/components/inspection/offline-queue";
import { tagOutAlertEmail } from "@/lib/inspections/alert-email";

describe("tag-out alert e-mail", () => {
  const mail = tagOutAlertEmail({
    shopName: "Millrace <Forge>",
    pressName: "Bay 1",
    templateName: "Monthly inspection",
    signerName: "Ravi",
    signedAt: new Date("2026-12-02T06:00:00Z"),
    failed: [{ text: "Bolts tight", note: "Two nuts <loose> & turning" }],
    link: "https://presswright.example/inspections/abc",
  });
  it("names the shop in subject, text and HTML and escapes what people typed", () => {
    expect(mail.subject).toBe("Millrace <Forge>: Bay 1 is tagged out");
    expect(mail.text).toContain("Millrace <Forge>");
    expect(mail.text).toContain("- Bolts tight — Two nuts <loose> & turning");
    expect(mail.html).toContain("Millrace &lt;Forge&gt;");
    expect(mail.html).toContain("Two nuts &lt;loose&gt; &amp; turning");
    expect(mail.html).not.toContain("<loose>");
    expect(mail.text).toContain("2026-12-02 06:00 UTC");
  });
});

describe("answers kept for an offline reload", () => {
  it("takes, per item, the answer the server recorded last", () => {
    const page = { a: { outcome: "pass" as const, note: null, at: 2000 }, b: { outcome: null, note: null, at: null } };
    const stored = { a: { outcome: "fail" as const, note: "old", at: 1000 }, b: { outcome: "na" as const, note: null, at: 1500 } };
    expect(newestAnswers(page, stored)).toEqual({ a: page.a, b: stored.b });
    expect(newestAnswers(page, null)).toEqual(page);
  });
});
