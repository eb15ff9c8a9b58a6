// Benchmark (issue 13, public pages): throughput of the public pages, signed out, against the
// production server, each beside the 404 page measured the same way (the 404 page is the
// reference: its figure moves with the machine's load, the ratio much less). Starts its own
// server (scripts/server.mjs) from an existing production build (NEXT_DIST_DIR, default .next) on
// BENCH_PORT (default 3191) against DATABASE_URL, runs autocannon on each page in turn and prints
// the figures. Asserts nothing.
//   npm run bench:public-pages                       (after `npm run build`; MariaDB running)
//   BENCH_SECONDS=10 BENCH_CONNECTIONS=10 npm run bench:public-pages
import autocannon from "autocannon";
import { startBenchServer } from "./lib/bench-server.mjs";

const PORT = Number(process.env.BENCH_PORT ?? 3191);
const BASE = `http://127.0.0.1:${PORT}`;
const SECONDS = Number(process.env.BENCH_SECONDS ?? 10);
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 10);
const PAGES = ["/no-such-page", "/", "/sizing", "/sizing/gauge-card?bore=125&relief=210", "/sign-in", "/sign-up", "/forgot-password"];

const { stop, waitForHealth } = startBenchServer(PORT);

async function measure(path) {
  // Warm the route first (first render, file cache) so the figure is the steady state.
  for (let i = 0; i < 5; i++) await (await fetch(`${BASE}${path}`)).text();
  const r = await autocannon({ url: `${BASE}${path}`, connections: CONNECTIONS, duration: SECONDS });
  const bad = r.non2xx - (path === "/no-such-page" ? r.requests.total : 0);
  return { path, rps: r.requests.average, p50: r.latency.p50, p99: r.latency.p99, errors: r.errors + r.timeouts + Math.max(bad, 0) };
}

await waitForHealth();
const rows = [];
for (const path of PAGES) rows.push(await measure(path));
const reference = rows[0].rps;
console.log(`public pages, signed out: ${CONNECTIONS} connections, ${SECONDS} s each, ${BASE} (${process.env.NEXT_DIST_DIR ?? ".next"})`);
for (const r of rows) {
  console.log(
    `${r.path.padEnd(42)} ${r.rps.toFixed(0).padStart(6)} req/s  p50 ${String(r.p50).padStart(4)} ms  p99 ${String(r.p99).padStart(5)} ms  ` +
      `${(r.rps / reference).toFixed(2)}× the 404 page${r.errors ? `  (${r.errors} errors or unexpected statuses)` : ""}`,
  );
}
stop();
