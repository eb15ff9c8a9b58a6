import { describe, expect, it } from "vitest";
import { composeEmail } from "@/lib/email/compose";
import { invitationEmail } from "@/lib/email/messages/invitation";
import { passwordResetEmail } from "@/lib/email/messages/password-reset";
import { reminderDigestEmail } from "@/lib/email/messages/reminder-digest";
import { describeSmtpError, retryDelayMs } from "@/lib/email/sender";

describe("composeEmail", () => {
  it("carries the shop's name in text and HTML and escapes every value", () => {
    const { text, html } = composeEmail({ shopName: "Smith & <Sons>", title: "A \"test\"", paragraphs: ["<script>x</script>"], items: ["one"], link: { href: "https://example.test/a?b=1&c=2", label: "Go" } });
    expect(text).toContain("Smith & <Sons>");
    expect(text).toContain("Go: https://example.test/a?b=1&c=2");
    expect(text).toContain("- one");
    expect(html).toContain("Smith &amp; &lt;Sons&gt;");
    expect(html).not.toContain("<script>");
    expect(html).toContain('href="https://example.test/a?b=1&amp;c=2"');
  });
});

describe("messages", () => {
  it("name the shop and the link in each", () => {
    const invite = invitationEmail({ shopName: "Millrace", inviterName: "Dana", role: "inspector", link: "http://x.test/invite/abc", expiresInDays: 7 });
    expect(invite.subject).toContain("Millrace");
    expect(invite.text).toContain("an inspector");
    expect(invite.html).toContain("http://x.test/invite/abc");
    const reset = passwordResetEmail({ shopName: "Lena's shop", link: "http://x.test/reset-password/abc", expiresInMinutes: 30 });
    expect(reset.text).toContain("Lena's shop");
    expect(reset.text).toContain("30 minutes");
    const digest = reminderDigestEmail({ shopName: "Millrace", link: "http://x.test/dashboard", lines: [{ pressName: "Bay 1", title: "Filter", state: "overdue", due: "1 Dec 2026" }, { pressName: "Bay 2", title: "Relief", state: "due-soon", due: "" }] });
    expect(digest.subject).toBe("Millrace: service 1 overdue, 1 due soon");
    expect(digest.text).toContain("- OVERDUE · Bay 1 · Filter (1 Dec 2026)");
    expect(digest.text).toContain("- Due soon · Bay 2 · Relief\n");
  });
});

describe("sender helpers", () => {
  it("backs off exponentially up to an hour", () => {
    expect([1, 2, 3, 4].map(retryDelayMs)).toEqual([30_000, 60_000, 120_000, 240_000]);
    expect(retryDelayMs(20)).toBe(3_600_000);
  });
  it("logs SMTP errors without credentials", () => {
    const line = describeSmtpError(Object.assign(new Error("Invalid login: user=dana password=hunter2"), { code: "EAUTH", responseCode: 535 }));
    expect(line).toContain("EAUTH 535");
    expect(line).not.toContain("hunter2");
  });
});
