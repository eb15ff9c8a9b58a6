/**
 * The production build and server the benchmark measures: `next build` into BENCH_DIST_DIR
 * (default .next-bench) when it has no build yet or BENCH_REBUILD=1, then `node scripts/server.mjs`
 * with NODE_ENV=production on BENCH_PORT against the given database.
 */
import { spawn, spawnSync } from "node:child_process";
import { existsSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";

export const ROOT = fileURLToPath(new URL("../..", import.meta.url));
export const DIST_DIR = process.env.BENCH_DIST_DIR ?? ".next-bench";

/** The local uploads fake's settings and the local chain key, as scripts/local-env.sh exports them. */
function localEnv(): Record<string, string> {
  const out = spawnSync("bash", ["-c", "source scripts/local-env.sh && env -0"], { cwd: ROOT, encoding: "utf8" });
  const entries = out.stdout.split("\0").filter(Boolean).map((line) => [line.slice(0, line.indexOf("=")), line.slice(line.indexOf("=") + 1)] as const);
  return Object.fromEntries(entries.filter(([name]) => name.startsWith("UPLOADTHING_") || name === "INSPECTION_CHAIN_KEY"));
}

export function ensureBuild(): void {
  if (existsSync(join(ROOT, DIST_DIR, "BUILD_ID")) && process.env.BENCH_REBUILD !== "1") {
    console.log(`bench: reusing the production build in ${DIST_DIR}/ (BENCH_REBUILD=1 rebuilds)`);
    return;
  }
  console.log(`bench: building into ${DIST_DIR}/ …`);
  const build = spawnSync("npx", ["next", "build"], { cwd: ROOT, stdio: "inherit", env: { ...process.env, NEXT_DIST_DIR: DIST_DIR, NEXT_TELEMETRY_DISABLED: "1" } });
  if (build.status !== 0) throw new Error("next build failed");
}

export type RunningServer = { base: string; lines: string[]; stop: () => Promise<void> };

/** Starts the production server; `queryCount` turns on PRESSWRIGHT_QUERY_COUNT ("sql" also logs statements). */
export async function startServer(databaseUrl: string, queryCount?: "1" | "sql"): Promise<RunningServer> {
  const port = Number(process.env.BENCH_PORT ?? 3290);
  const base = `http://127.0.0.1:${port}`;
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    ...localEnv(),
    NODE_ENV: "production",
    NEXT_DIST_DIR: DIST_DIR,
    NEXT_TELEMETRY_DISABLED: "1",
    PORT: String(port),
    DATABASE_URL: databaseUrl,
    // Plain-HTTP loopback: the session cookie without Secure, as the browser tests do.
    INSECURE_COOKIES: "1",
    EMAIL_POLL_MS: "3600000",
    // One trusted hop: targets marked manyClients send a different X-Forwarded-For per request.
    TRUSTED_PROXY_HOPS: "1",
  };
  delete env.PRESSWRIGHT_QUERY_COUNT;
  if (queryCount) env.PRESSWRIGHT_QUERY_COUNT = queryCount;
  const child = spawn("node", ["scripts/server.mjs"], { cwd: ROOT, env, stdio: ["ignore", "pipe", "pipe"] });
  const lines: string[] = [];
  let pending = "";
  const collect = (chunk: Buffer) => {
    pending += chunk.toString("utf8");
    const parts = pending.split("\n");
    pending = parts.pop() ?? "";
    lines.push(...parts);
  };
  child.stdout.on("data", collect);
  child.stderr.on("data", collect);
  const exited = new Promise<void>((resolve) => child.once("exit", () => resolve()));
  const deadline = Date.now() + 120_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`the server exited:\n${lines.join("\n")}`);
    try {
      if ((await fetch(`${base}/api/health`)).ok) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) throw new Error(`no healthy answer from ${base} within 120 s`);
    await new Promise((r) => setTimeout(r, 500));
  }
  return {
    base,
    lines,
    stop: async () => {
      child.kill("SIGTERM");
      await exited;
    },
  };
}
