// Security headers on every page (design: reliability-and-security.md, "Headers"), checked over
// HTTP against the production server the browser tests use. The pages come from app/**/page.tsx,
// so a new page is checked without being listed; a dynamic segment this file cannot fill fails.
// Public pages are fetched signed out and signed in, the shop's pages signed in (demo manager).
import { beforeAll, describe, expect, it } from "vitest";
import { pageFiles } from "../app-files";
import { BASE_URL } from "./browser";
import { isPublic, NOT_FOUND_URL, resolveIds, signInCookie, urlOf, type SegmentIds } from "./page-urls";

let cookie = "";
let ids: SegmentIds = {};

type Checked = { url: string; signedIn: boolean; problems: string[] };

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
  if (signedIn && !/\bno-store\b/.test(h("cache-control"))) problems.push(`signed in without no-store: Cache-Control "${h("cache-control")}"`);
  // The policy is only as good as the page: every inline script must carry this response's nonce.
  const nonce = /'nonce-([^']+)'/.exec(scriptSrc)?.[1];
  for (const [tag] of html.matchAll(/<script\b[^>]*>/g)) {
    if (/\ssrc=/.test(tag)) continue;
    if (!nonce || !tag.includes(`nonce="${nonce}"`)) problems.push(`inline script without the nonce: ${tag.slice(0, 80)}`);
  }
  return { url, signedIn, problems };
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
      if (isPublic(file)) results.push(await check(url, false));
      results.push(await check(url, true));
    }
    // app/not-found.tsx: the page every unknown address gets.
    results.push(await check(NOT_FOUND_URL, false), await check(NOT_FOUND_URL, true));
    console.info(`[headers] ${pages.length} pages and the 404 page, ${results.length} responses checked`);
    expect(results.filter((r) => r.problems.length > 0).map((r) => `${r.url} (${r.signedIn ? "signed in" : "signed out"}): ${r.problems.join("; ")}`)).toEqual([]);
  });
});
