import { createHash } from "node:crypto";
import { mkdirSync, mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { inlineScriptHashes } from "@/lib/csp/inline-script-hashes";
import { loadPrerenderedBuild, scriptHashesFor } from "@/lib/csp/prerendered-pages";
import { hashSources, nonceSources, pagePolicy } from "@/lib/csp/policy";

const sha = (text: string) => `sha256-${createHash("sha256").update(text, "utf8").digest("base64")}`;

describe("inlineScriptHashes", () => {
  it("hashes the exact text of each inline script, skips scripts with a src and repeats", () => {
    const first = 'self.__next_f.push([1,"a\\u003cb"])';
    const second = "\n  (self.__next_f=self.__next_f||[]).push([0]) ";
    const html = `<html><head><script src="/_next/static/chunks/a.js" async=""></script><script>${first}</script></head>` +
      `<body><SCRIPT nonce="x">${second}</SCRIPT><script>${first}</script><script id="s" type="module" src='/b.js'></script></body></html>`;
    expect(inlineScriptHashes(html)).toEqual([sha(first), sha(second)]);
  });

  it("hashes non-ASCII text as UTF-8, as browsers do", () => {
    expect(inlineScriptHashes("<script>document.title='Größe · 5 t'</script>")).toEqual([sha("document.title='Größe · 5 t'")]);
  });

  it("finds nothing in a page without inline scripts", () => {
    expect(inlineScriptHashes('<p>no scripts</p><script src="/x.js"></script>')).toEqual([]);
  });
});

describe("loadPrerenderedBuild and scriptHashesFor", () => {
  function fakeBuild(): string {
    const dist = mkdtempSync(join(tmpdir(), "csp-dist-"));
    mkdirSync(join(dist, "server", "app", "sizing"), { recursive: true });
    const routes = { "/": {}, "/sizing": {}, "/sizing/gauge-card": {}, "/serwist/sw.js": {} };
    writeFileSync(join(dist, "prerender-manifest.json"), JSON.stringify({ routes }));
    const route = (regex: string) => ({ regex });
    writeFileSync(
      join(dist, "routes-manifest.json"),
      JSON.stringify({ staticRoutes: [route("^/(?:/)?$"), route("^/sizing(?:/)?$"), route("^/dashboard(?:/)?$")], dynamicRoutes: [route("^/presses/([^/]+?)(?:/)?$")] }),
    );
    writeFileSync(join(dist, "server", "app", "index.html"), "<script>one()</script>");
    writeFileSync(join(dist, "server", "app", "sizing.html"), "<script>two()</script><script>three()</script>");
    writeFileSync(join(dist, "server", "app", "sizing", "gauge-card.html"), "<p>none</p>");
    writeFileSync(join(dist, "server", "app", "_not-found.html"), "<script>four()</script>");
    return dist;
  }

  it("reads every prerendered page that has HTML, and the 404 page", () => {
    const { pages } = loadPrerenderedBuild(fakeBuild());
    expect([...pages.keys()].sort()).toEqual(["/", "/_not-found", "/sizing", "/sizing/gauge-card"]);
    expect(pages.get("/sizing")).toEqual([sha("two()"), sha("three()")]);
  });

  it("answers a prerendered page with its hashes, an unrouted path with the 404 page's, a page rendered per request with null", () => {
    const build = loadPrerenderedBuild(fakeBuild());
    expect(scriptHashesFor(build, "/")).toEqual([sha("one()")]);
    expect(scriptHashesFor(build, "/no-such-page")).toEqual([sha("four()")]);
    expect(scriptHashesFor(build, "/presses/x/y")).toEqual([sha("four()")]);
    expect(scriptHashesFor(build, "/dashboard")).toBeNull();
    expect(scriptHashesFor(build, "/presses/abc")).toBeNull();
  });

  it("knows no page in a folder without a build (every page then gets the nonce policy)", () => {
    const build = loadPrerenderedBuild(mkdtempSync(join(tmpdir(), "csp-empty-")));
    expect(scriptHashesFor(build, "/")).toBeNull();
    expect(scriptHashesFor(build, "/no-such-page")).toBeNull();
  });
});

describe("pagePolicy", () => {
  const directives = (csp: string) => new Map(csp.split("; ").map((d) => [d.split(" ")[0], d]));

  it("gives a prerendered page 'self' and its hashes only: no nonce, no 'unsafe-inline', no 'strict-dynamic'", () => {
    const policy = directives(pagePolicy(hashSources([sha("one()")]), { NODE_ENV: "production" }));
    expect(policy.get("script-src")).toBe(`script-src 'self' '${sha("one()")}'`);
    expect(policy.get("object-src")).toBe("object-src 'none'");
    expect(policy.get("base-uri")).toBe("base-uri 'none'");
    expect(policy.get("frame-ancestors")).toBe("frame-ancestors 'none'");
  });

  it("gives a page rendered per request its nonce with 'strict-dynamic', and 'unsafe-eval' only in development", () => {
    expect(directives(pagePolicy(nonceSources("abc"), { NODE_ENV: "production" })).get("script-src")).toBe("script-src 'self' 'nonce-abc' 'strict-dynamic'");
    expect(directives(pagePolicy(nonceSources("abc"), { NODE_ENV: "development" })).get("script-src")).toContain("'unsafe-eval'");
  });
});
