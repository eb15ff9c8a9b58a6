import { existsSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { distDirOf } from "@/lib/dist-dir";
import { inlineScriptHashes } from "./inline-script-hashes";

/**
 * The inline-script hashes of every page Next prerendered at build time, keyed by path, and the
 * patterns of every route. Read once per server from the build's own output (the prerender and
 * routes manifests and the HTML files they list), so the hashes always belong to the HTML this
 * server sends. Not in development: `next dev` renders every page per request, and the nonce
 * policy covers it.
 */
export type PrerenderedBuild = { pages: Map<string, string[]>; routes: RegExp[] };

type PrerenderManifest = { routes: Record<string, unknown> };
type RoutesManifest = { staticRoutes: { regex: string }[]; dynamicRoutes: { regex: string }[] };

/** Next's prerendered 404 page, sent for every address that matches no route. */
export const NOT_FOUND_PAGE = "/_not-found";

function readJson<T>(file: string): T | null {
  return existsSync(file) ? (JSON.parse(readFileSync(file, "utf8")) as T) : null;
}

export function loadPrerenderedBuild(distDir: string): PrerenderedBuild {
  const pages = new Map<string, string[]>();
  const prerendered = readJson<PrerenderManifest>(join(distDir, "prerender-manifest.json"));
  const routed = readJson<RoutesManifest>(join(distDir, "routes-manifest.json"));
  for (const route of [...Object.keys(prerendered?.routes ?? {}), NOT_FOUND_PAGE]) {
    const htmlFile = join(distDir, "server", "app", `${route === "/" ? "/index" : route}.html`);
    if (existsSync(htmlFile)) pages.set(route, inlineScriptHashes(readFileSync(htmlFile, "utf8")));
  }
  const routes = [...(routed?.staticRoutes ?? []), ...(routed?.dynamicRoutes ?? [])].map((r) => new RegExp(r.regex));
  return { pages, routes };
}

/**
 * The hashes for the HTML a path is answered with when that HTML was prerendered: the page's own,
 * or the 404 page's for a path no route matches. Null when the page is rendered per request
 * (including a page that calls notFound() while rendering: it carries the nonce).
 */
export function scriptHashesFor(build: PrerenderedBuild, pathname: string): string[] | null {
  const own = build.pages.get(pathname);
  if (own) return own;
  if (build.routes.length > 0 && !build.routes.some((r) => r.test(pathname))) return build.pages.get(NOT_FOUND_PAGE) ?? null;
  return null;
}

let build: PrerenderedBuild | undefined;

export function prerenderedScriptHashes(pathname: string): string[] | null {
  if (process.env.NODE_ENV === "development") return null;
  // Only the build folder is read; the comment keeps Turbopack from tracing the whole project.
  build ??= loadPrerenderedBuild(join(/*turbopackIgnore: true*/ process.cwd(), distDirOf(process.env)));
  return scriptHashesFor(build, pathname);
}
