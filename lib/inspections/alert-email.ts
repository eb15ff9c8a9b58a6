/** The tag-out alert a failed critical item sends to a shop's managers, in our own words. */
export type TagOutAlert = {
  shopName: string;
  pressName: string;
  templateName: string;
  signerName: string;
  signedAt: Date;
  failed: { text: string; note: string | null }[];
  link: string;
};

const escapeHtml = (s: string): string =>
  s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c] ?? c);

export function tagOutAlertEmail(alert: TagOutAlert): { subject: string; text: string; html: string } {
  const when = alert.signedAt.toISOString().replace("T", " ").slice(0, 16) + " UTC";
  const subject = `${alert.shopName}: ${alert.pressName} is tagged out`;
  const lines = alert.failed.map((f) => `- ${f.text}${f.note ? ` — ${f.note}` : ""}`);
  const text = [
    `${alert.shopName}`,
    "",
    `${alert.pressName} is tagged out. ${alert.signerName} signed the "${alert.templateName}" checklist at ${when} and marked a critical item as failed:`,
    "",
    ...lines,
    "",
    "Nobody should use the press until it is put right and a passing inspection is signed, or a manager or inspector clears the tag-out with a recorded reason.",
    "",
    `Open the inspection: ${alert.link}`,
  ].join("\n");
  const html = [
    `<p><strong>${escapeHtml(alert.shopName)}</strong></p>`,
    `<p>${escapeHtml(alert.pressName)} is tagged out. ${escapeHtml(alert.signerName)} signed the “${escapeHtml(alert.templateName)}” checklist at ${when} and marked a critical item as failed:</p>`,
    `<ul>${alert.failed.map((f) => `<li>${escapeHtml(f.text)}${f.note ? ` — ${escapeHtml(f.note)}` : ""}</li>`).join("")}</ul>`,
    "<p>Nobody should use the press until it is put right and a passing inspection is signed, or a manager or inspector clears the tag-out with a recorded reason.</p>",
    `<p><a href="${escapeHtml(alert.link)}">Open the inspection</a></p>`,
  ].join("\n");
  return { subject, text, html };
}
