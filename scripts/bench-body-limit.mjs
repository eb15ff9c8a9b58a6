// Benchmark (hardening #2): the production server's memory while it is sent 20 concurrent 200 MB
// request bodies, declared (Content-Length) and chunked, to POST /api/sizing and
// POST /api/auth/sign-in. Starts its own server (scripts/server.mjs) from an existing production
// build (NEXT_DIST_DIR, default .next) on BENCH_PORT (default 3190) against DATABASE_URL, samples
// the server's resident memory from /proc every 25 ms, and prints the figures. Asserts nothing.
// "closed" in the answers: the server hung up while this client was still writing, so Node's client
// reports the write error instead of the 413 (curl, which reads while it writes, shows the 413).
//   npm run bench:body-limit          (after `npx next build`; the database must be running)
import { readFileSync } from "node:fs";
import { request } from "node:http";
import { startBenchServer } from "./lib/bench-server.mjs";

const PORT = Number(process.env.BENCH_PORT ?? 3190);
const CONCURRENT = 20;
const BODY_BYTES = 200 * 1024 * 1024;
const CHUNK = Buffer.alloc(64 * 1024, 0x20);

const { server, stop, waitForHealth } = startBenchServer(PORT);

function rssMb() {
  const status = readFileSync(`/proc/${server.pid}/status`, "utf8");
  return Number(/VmRSS:\s+(\d+) kB/.exec(status)?.[1] ?? 0) / 1024;
}

/** Streams up to 200 MB until the server answers or closes; resolves with the status and bytes sent. */
function oversized(path, declared) {
  return new Promise((resolve) => {
    let sent = 0;
    let done = false;
    const finish = (status) => {
      if (done) return;
      done = true;
      req.destroy();
      resolve({ status, sentMb: sent / 1024 / 1024 });
    };
    const headers = { "content-type": "application/json", origin: `http://127.0.0.1:${PORT}` };
    if (declared) headers["content-length"] = String(BODY_BYTES);
    else headers["transfer-encoding"] = "chunked";
    const req = request({ host: "127.0.0.1", port: PORT, method: "POST", path, headers, agent: false }, (res) => {
      res.resume();
      finish(res.statusCode);
    });
    req.on("error", () => finish("closed"));
    const write = () => {
      while (!done && sent < BODY_BYTES) {
        sent += CHUNK.length;
        if (!req.write(CHUNK)) return void req.once("drain", write);
      }
      if (!done) req.end();
    };
    write();
  });
}

async function scenario(name, path, declared) {
  global.gc?.();
  await new Promise((r) => setTimeout(r, 500));
  const before = rssMb();
  let peak = before;
  const sampler = setInterval(() => (peak = Math.max(peak, rssMb())), 25);
  const started = Date.now();
  const results = await Promise.all(Array.from({ length: CONCURRENT }, () => oversized(path, declared)));
  const elapsed = Date.now() - started;
  await new Promise((r) => setTimeout(r, 300));
  clearInterval(sampler);
  const statuses = {};
  for (const r of results) statuses[r.status] = (statuses[r.status] ?? 0) + 1;
  const maxSent = Math.max(...results.map((r) => r.sentMb));
  console.log(
    `${name.padEnd(38)} RSS before ${before.toFixed(0)} MB, peak ${peak.toFixed(0)} MB (+${(peak - before).toFixed(0)} MB); ` +
      `answers ${JSON.stringify(statuses)}; most sent by one client before the answer ${maxSent.toFixed(1)} MB; ${elapsed} ms`,
  );
  return peak - before;
}

try {
  await waitForHealth();
  // Warm up the routes once with normal requests, so first-use compilation is not counted.
  await fetch(`http://127.0.0.1:${PORT}/api/sizing`, { method: "POST", headers: { "content-type": "application/json" }, body: "{}" });
  await fetch(`http://127.0.0.1:${PORT}/api/auth/sign-in`, { method: "POST", headers: { "content-type": "application/json", origin: `http://127.0.0.1:${PORT}` }, body: "{}" });
  console.log(`${CONCURRENT} concurrent requests with ${BODY_BYTES / 1024 / 1024} MB bodies each, server pid ${server.pid}:`);
  const growth = [];
  growth.push(await scenario("POST /api/sizing, Content-Length", "/api/sizing", true));
  growth.push(await scenario("POST /api/sizing, chunked", "/api/sizing", false));
  growth.push(await scenario("POST /api/auth/sign-in, Content-Length", "/api/auth/sign-in", true));
  growth.push(await scenario("POST /api/auth/sign-in, chunked", "/api/auth/sign-in", false));
  console.log(`largest growth of the server's resident memory in any scenario: ${Math.max(...growth).toFixed(0)} MB`);
} finally {
  stop();
}
