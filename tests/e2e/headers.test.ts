// Security headers on every page (design: reliability-and-security.md, "Headers"), checked over
// HTTP against the production server the browser tests use. The pages come from app/**/page.tsx,
// so a new page is checked without being listed; a dynamic segment this file cannot fill fails.
// Public pages are fetched signed out and signed in, the shop's pages signed in (demo manager).
// A page rendered per request carries a nonce; a prerendered page (proxy.ts, hash-based policy)
// lists the sha256 of each of its inline scripts and sends everyone the same HTML.
import { createHash } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { DEMO_PASSWORD, DEMO_USERS } from "@/db/demo-data";
import { pageFiles } from "../app-files";
import { BASE_URL } from "./browser";

/** An id that names nothing: token pages then answer their "not found / expired" page. */
const UNKNOWN_TOKEN = "aaaaaaaaaaaaaaaaaaaaaaaa";
let cookie = "";
const ids: Record<string, string> = {};

async function api<T>(path: string): Promise<T> {
  const res = await fetch(`${BASE_URL}${path}`, { headers: { cookie } });
  expect(res.status, path).toBe(200);
  return (await res.json()) as T;
}

/** Fills every dynamic segment from the demo shop, as its manager sees it. */
async function resolveIds(): Promise<void> {
  const { presses } = await api<{ presses: { id: string }[] }>("/api/presses");
  for (const { id } of presses) {
    const [{ components }, { entries }, { rows }] = await Promise.all([
      api<{ components: { id: string }[] }>(`/api/presses/${id}/components`),
      api<{ entries: { id: string }[] }>(`/api/presses/${id}/service-log`),
      api<{ rows: { id: string }[] }>(`/api/presses/${id}/inspections`),
    ]);
    if (components[0] && entries[0] && !ids.pressId) Object.assign(ids, { pressId: id, componentId: components[0].id, entryId: entries[0].id });
    if (rows[0] && !ids.inspectionId) ids.inspectionId = rows[0].id;
  }
  const { shops } = await api<{ shops: { id: string }[] }>("/api/me");
  const { templates } = await api<{ templates: { id: string }[] }>(`/api/inspection-templates?shopId=${shops[0]!.id}`);
  ids.templateId = templates[0]!.id;
  ids.token = UNKNOWN_TOKEN;
}

/** app/(app)/presses/[pressId]/page.tsx → /presses/<id>; route groups drop out. */
function urlOf(file: string): string {
  const segments = file.replace(/^app\//, "").replace(/\/?page\.tsx$/, "").split("/").filter((s) => s && !/^\(.*\)$/.test(s));
  return "/" + segments.map((s) => {
    const name = /^\[(.+)\]$/.exec(s)?.[1];
    if (!name) return s;
    if (!ids[name]) throw new Error(`headers.test.ts cannot fill [${name}] for ${file}: add it to resolveIds()`);
    return ids[name];
  }).join("/");
}

const isPublic = (file: string): boolean => !file.startsWith("app/(app)/");

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
  const manager = DEMO_USERS.find((u) => u.key === "manager")!;
  const res = await fetch(`${BASE_URL}/api/auth/sign-in`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: BASE_URL },
    body: JSON.stringify({ email: manager.email, password: DEMO_PASSWORD }),
  });
  expect(res.status).toBe(200);
  cookie = res.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
  await resolveIds();
});

describe("security headers on every page", () => {
  it("are on every page of app/, public ones signed out and signed in, the shop's signed in", async () => {
    const pages = pageFiles();
    const results: Checked[] = [];
    for (const file of pages) {
      const url = urlOf(file);
      const signedIn = await check(url, true);
      if (isPublic(file)) {
        const signedOut = await check(url, false);
        if (signedIn.prerendered && signedIn.html !== signedOut.html) signedIn.problems.push("prerendered, yet different HTML signed in");
        results.push(signedOut);
      }
      results.push(signedIn);
    }
    // app/not-found.tsx: the page every unknown address gets.
    results.push(await check("/no-such-page", false), await check("/no-such-page", true));
    console.info(`[headers] ${pages.length} pages and the 404 page, ${results.length} responses checked, ${results.filter((r) => r.prerendered).length} of them prerendered (hash-based policy)`);
    expect(results.filter((r) => r.problems.length > 0).map((r) => `${r.url} (${r.signedIn ? "signed in" : "signed out"}): ${r.problems.join("; ")}`)).toEqual([]);
  });
});
