/**
 * First-load JavaScript of a page, gzipped: every script chunk its HTML references — <script>
 * tags and the chunks named in its flight data. Chunks marked noModule (polyfills for browsers
 * without ES modules) are listed but not counted: current browsers never download them.
 * Used by `npm run bench` for every route of the build and by scripts/bench-first-load.ts.
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { gzipSync } from "node:zlib";

export const FIRST_LOAD_TARGET_KB = 200;
export type Chunk = { url: string; noModule: boolean; gzipBytes: number };

export function referencedChunks(html: string): Map<string, boolean> {
  const chunks = new Map<string, boolean>(); // url → noModule
  for (const tag of html.match(/<script[^>]*\ssrc="[^"]+"[^>]*>/g) ?? []) {
    const src = /\ssrc="([^"]+)"/.exec(tag)?.[1];
    if (src) chunks.set(src, /\snoModule/i.test(tag));
  }
  // Client components' chunks are also named inside the inline flight data (escaped or not).
  for (const match of html.matchAll(/\/_next\/static\/chunks\/[\w./-]+?\.js/g)) {
    if (!chunks.has(match[0])) chunks.set(match[0], false);
  }
  return chunks;
}

const sizes = new Map<string, number>();
async function gzipSize(url: string): Promise<number> {
  const known = sizes.get(url);
  if (known !== undefined) return known;
  const res = await fetch(url);
  if (!res.ok) throw new Error(`${url}: HTTP ${res.status}`);
  const size = gzipSync(Buffer.from(await res.arrayBuffer()), { level: 9 }).length;
  sizes.set(url, size);
  return size;
}

/** The chunks of one page's HTML, largest first, and the total that counts. */
export async function firstLoadJs(base: string, html: string): Promise<{ chunks: Chunk[]; totalGzipBytes: number }> {
  const chunks: Chunk[] = [];
  for (const [url, noModule] of referencedChunks(html)) chunks.push({ url, noModule, gzipBytes: await gzipSize(base + url) });
  chunks.sort((a, b) => b.gzipBytes - a.gzipBytes);
  return { chunks, totalGzipBytes: chunks.filter((c) => !c.noModule).reduce((sum, c) => sum + c.gzipBytes, 0) };
}

/** Every page route of a build ("/presses/[pressId]"), from its app-path-routes manifest. */
export function buildRoutes(root: string, distDir: string): string[] {
  const manifest = JSON.parse(readFileSync(join(root, distDir, "app-path-routes-manifest.json"), "utf8")) as Record<string, string>;
  return [...new Set(Object.entries(manifest).filter(([entry]) => entry.endsWith("/page")).map(([, route]) => route))].sort();
}

/** A route with its dynamic segments filled from `segments`, or null when one is unknown. */
export function fillRoute(route: string, segments: Record<string, string>): string | null {
  let missing = false;
  const url = route.replace(/\[([^\]]+)\]/g, (_, name: string) => segments[name] ?? ((missing = true), ""));
  return missing ? null : url;
}

export const kB = (bytes: number): string => `${(bytes / 1000).toFixed(1)} kB`;
