/**
 * The one layout every e-mail uses, as plain text and HTML from the same parts. Other features
 * build their messages with it, e.g.
 *   const { text, html } = composeEmail({ shopName, title: "Bay 1 is tagged out", paragraphs: [...], link: { href, label: "Open the press" } });
 *   await enqueueEmail(tx, { kind: "tag-out-alert", to, subject: title, text, html, shopId });
 * Every value is escaped for HTML; the shop's name heads both versions.
 */
export type EmailParts = {
  shopName: string;
  title: string;
  paragraphs: readonly string[];
  /** A list under the paragraphs (e.g. tasks due), one line each. */
  items?: readonly string[];
  link?: { href: string; label: string };
  /** Small print at the end, e.g. why the reader got this message. */
  footer?: string;
};

export type EmailContent = { text: string; html: string };

export function escapeHtml(value: string): string {
  return value.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;").replace(/'/g, "&#39;");
}

export function composeEmail(parts: EmailParts): EmailContent {
  const text = [
    parts.shopName,
    "",
    parts.title,
    "",
    ...parts.paragraphs.flatMap((p) => [p, ""]),
    ...(parts.items?.length ? [...parts.items.map((i) => `- ${i}`), ""] : []),
    ...(parts.link ? [`${parts.link.label}: ${parts.link.href}`, ""] : []),
    ...(parts.footer ? ["--", parts.footer] : []),
  ].join("\n");

  const p = (body: string) => `<p style="margin:0 0 14px;line-height:1.5">${escapeHtml(body)}</p>`;
  const html = `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width"><title>${escapeHtml(parts.title)}</title></head>
<body style="margin:0;padding:24px;background:#f4f6f8;font-family:Helvetica,Arial,sans-serif;color:#14212b">
<div style="max-width:560px;margin:0 auto;background:#ffffff;border-radius:8px;padding:24px;border:1px solid #cdd5dc">
<p style="margin:0 0 4px;font-size:13px;color:#465665">${escapeHtml(parts.shopName)}</p>
<h1 style="margin:0 0 16px;font-size:20px">${escapeHtml(parts.title)}</h1>
${parts.paragraphs.map(p).join("\n")}
${parts.items?.length ? `<ul style="margin:0 0 14px;padding-left:20px;line-height:1.5">${parts.items.map((i) => `<li>${escapeHtml(i)}</li>`).join("")}</ul>` : ""}
${parts.link ? `<p style="margin:0 0 14px"><a href="${escapeHtml(parts.link.href)}" style="display:inline-block;background:#cf8118;color:#14212b;font-weight:bold;text-decoration:none;padding:10px 16px;border-radius:6px">${escapeHtml(parts.link.label)}</a></p><p style="margin:0 0 14px;font-size:12px;color:#5c6e7d;word-break:break-all">${escapeHtml(parts.link.href)}</p>` : ""}
${parts.footer ? `<p style="margin:16px 0 0;font-size:12px;color:#5c6e7d">${escapeHtml(parts.footer)}</p>` : ""}
</div></body></html>`;
  return { text, html };
}
