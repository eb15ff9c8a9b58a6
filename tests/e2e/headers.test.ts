// Security headers on every page (design: reliability-and-security.md, "Headers"), checked over
// HTTP against the production server the browser tests use. The pages come from app/**/page.tsx,
// so a new page is checked without being listed; a dynamic segment this file cannot fill fails.
// Public pages are fetched signed out and signed in, the shop's pages signed in (demo manager).
// A page rendered per request carries a nonce; a prerendered page (proxy.ts, hash-based policy)
// lists the sha256 of each of its inline scripts and sends everyone the same HTML.
import { createHash } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { pageFiles } from "../app-files";
import { BASE_URL } from "./browser";
import { isPublic, NOT_FOUND_URL, resolveIds, signInCookie, urlOf, type SegmentIds } from "./page-urls";

let cookie = "";
let ids: SegmentIds = {};

type Checked = { url: string; signedIn: boolean; problems: string[]; prerendered: boolean; html: string };

const sha256 = (text: string): string => createHash("sha256").update(text, "utf8").digest("base64");

async function check(url: string, signedIn: boolean): Promise<Checked> {
  const res = await fetch(`${BASE_URL}${url}`, { headers: signedIn ? { cookie } : {}, redirect: "follow" });
  const html = await res.text();
  const problems: string[] = [];
  const h = (name: string) => res.headers.get(name) ?? "";
  if (res.status >= 500) problems.push(`status ${res.status}`);
  const csp = h("content-security-policy");
  const directive = (name: string) => csp.split(";").map((d) => d.trim()).find((d) => d.startsWith(`${name} `)) ?? "";
  const scriptSrc = directive("script-src");
  if (!/'nonce-[^']+'|'sha(256|384|512)-[^']+'/.test(scriptSrc)) problems.push(`script-src without a nonce or hash: "${scriptSrc}"`);
  if (scriptSrc.includes("'unsafe-inline'")) problems.push("script-src allows 'unsafe-inline'");
  if (directive("frame-ancestors") !== "frame-ancestors 'none'") problems.push(`frame-ancestors: "${directive("frame-ancestors")}"`);
  if (directive("object-src") !== "object-src 'none'") problems.push(`object-src: "${directive("object-src")}"`);
  if (directive("base-uri") !== "base-uri 'none'") problems.push(`base-uri: "${directive("base-uri")}"`);
  if (h("x-content-type-options") !== "nosniff") problems.push(`X-Content-Type-Options: "${h("x-content-type-options")}"`);
  if (!h("referrer-policy")) problems.push("no Referrer-Policy");
  if (res.headers.has("x-powered-by")) problems.push(`X-Powered-By: ${h("x-powered-by")}`);
  // The policy is only as good as the page: every inline script must carry this response's nonce,
  // or — on a prerendered page, whose policy has no nonce — have its hash listed.
  const nonce = /'nonce-([^']+)'/.exec(scriptSrc)?.[1];
  const hashes = new Set([...scriptSrc.matchAll(/'sha256-([^']+)'/g)].map((m) => m[1]));
  const prerendered = !nonce && hashes.size > 0;
  // A prerendered page is the same HTML for everyone (compared below), so it may be cached.
  if (signedIn && !prerendered && !/\bno-store\b/.test(h("cache-control"))) problems.push(`signed in without no-store: Cache-Control "${h("cache-control")}"`);
  if (prerendered && scriptSrc.includes("'strict-dynamic'")) problems.push("a hash-based script-src with 'strict-dynamic'");
  for (const [, attributes = "", body = ""] of html.matchAll(/<script\b([^>]*)>([\s\S]*?)<\/script>/g)) {
    if (/\ssrc=/.test(attributes)) continue;
    if (prerendered ? !hashes.has(sha256(body)) : !nonce || !attributes.includes(`nonce="${nonce}"`)) {
      problems.push(`inline script ${prerendered ? "whose hash is not in the policy" : "without the nonce"}: ${body.slice(0, 60)}`);
    }
  }
  return { url, signedIn, problems, prerendered, html };
}

beforeAll(async () => {
  cookie = await signInCookie();
  ids = await resolveIds(cookie);
});

describe("security headers on every page", () => {
  it("are on every page of app/, public ones signed out and signed in, the shop's signed in", async () => {
    const pages = pageFiles();
    const results: Checked[] = [];
    for (const file of pages) {
      const url = urlOf(file, ids);
      const signedIn = await check(url, true);
      if (isPublic(file)) {
        const signedOut = await check(url, false);
        if (signedIn.prerendered && signedIn.html !== signedOut.html) signedIn.problems.push("prerendered, yet different HTML signed in");
        results.push(signedOut);
      }
      results.push(signedIn);
    }
    // app/not-found.tsx: the page every unknown address gets.
    results.push(await check(NOT_FOUND_URL, false), await check(NOT_FOUND_URL, true));
    console.info(`[headers] ${pages.length} pages and the 404 page, ${results.length} responses checked, ${results.filter((r) => r.prerendered).length} of them prerendered (hash-based policy)`);
    expect(results.filter((r) => r.problems.length > 0).map((r) => `${r.url} (${r.signedIn ? "signed in" : "signed out"}): ${r.problems.join("; ")}`)).toEqual([]);
  });
});
