import { createHash } from "node:crypto";

const SCRIPT = /<script\b([^>]*)>([\s\S]*?)<\/script\s*>/gi;

/**
 * The CSP hash source ("sha256-<base64>") of every inline <script> in a page's HTML, in order and
 * without repeats. A script element's text is raw (no entity decoding), so the bytes between the
 * tags are exactly what the browser hashes. Scripts with a src are covered by 'self' instead.
 */
export function inlineScriptHashes(html: string): string[] {
  const hashes = new Set<string>();
  for (const [, attributes, body] of html.matchAll(SCRIPT)) {
    if (/\ssrc\s*=/i.test(` ${attributes}`)) continue;
    hashes.add(`sha256-${createHash("sha256").update(body ?? "", "utf8").digest("base64")}`);
  }
  return [...hashes];
}
