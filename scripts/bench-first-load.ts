/**
 * Benchmark: first-load JavaScript of the sizing page, gzipped, from a production build.
 * Serves the build in-process on a free port (no database needed: a visitor without a session
 * cookie never touches it), fetches /sizing as a browser would, and sums the gzip size of every
 * script chunk the page references — <script> tags and the chunks named in its flight data.
 * Chunks marked noModule (polyfills for browsers without ES modules) are listed but not counted:
 * current browsers never download them. The chart library is loaded after first paint, so it
 * appears here only as a separate line. Prints figures; asserts nothing. Target ≤ 200 kB.
 *
 *   NEXT_DIST_DIR=.next-bench npx tsx scripts/bench-first-load.ts     (after `next build` into that folder)
 *   BENCH_BASE_URL=http://127.0.0.1:3000 npx tsx scripts/bench-first-load.ts   (a server already running)
 */
import { existsSync } from "node:fs";
import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { firstLoadJs, FIRST_LOAD_TARGET_KB as TARGET_KB, kB } from "./bench/first-load";

const root = fileURLToPath(new URL("..", import.meta.url));
const PAGE = "/sizing";

async function startServer(): Promise<{ base: string; server?: Server }> {
  if (process.env.BENCH_BASE_URL) return { base: process.env.BENCH_BASE_URL.replace(/\/$/, "") };
  const distDir = process.env.NEXT_DIST_DIR ?? ".next";
  if (!existsSync(join(root, distDir, "BUILD_ID"))) {
    console.log(`first-load JS: no production build in ${distDir}/ — run \`NEXT_DIST_DIR=${distDir} npx next build\` first.`);
    process.exit(0);
  }
  Object.assign(process.env, { NODE_ENV: "production" });
  const { default: next } = await import("next");
  const app = next({ dev: false, dir: root, hostname: "127.0.0.1", port: 0 });
  await app.prepare();
  const handle = app.getRequestHandler();
  const server = createServer((req, res) => void handle(req, res));
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  return { base: `http://127.0.0.1:${(server.address() as AddressInfo).port}`, server };
}

const { base, server } = await startServer();
try {
  const res = await fetch(base + PAGE);
  const html = await res.text();
  if (!res.ok) throw new Error(`${PAGE}: HTTP ${res.status}`);
  const { chunks, totalGzipBytes: total } = await firstLoadJs(base, html);
  const counted = chunks.filter((c) => !c.noModule);

  console.log(`first-load JS of ${PAGE} (gzip -9, ${counted.length} chunks from ${base})`);
  for (const c of chunks) console.log(`  ${kB(c.gzipBytes).padStart(9)}  ${c.url}${c.noModule ? "  (noModule polyfills, not counted)" : ""}`);
  console.log(`  total ${kB(total)}   target ≤ ${TARGET_KB} kB: ${total <= TARGET_KB * 1000 ? "met" : "NOT met"}`);
} finally {
  server?.close();
}
process.exit(0);
