/**
 * npm run bench — every target of issue 13 in one run, against a production build on the scale
 * database (npm run seed:scale first), and writes docs/benchmarks.md.
 *
 *   1. query counts: the server with PRESSWRIGHT_QUERY_COUNT=sql, one request per target on the
 *      demo data (database presswright, migrated and seeded if empty) and on the scale data;
 *      first-load JS of every route and EXPLAIN of every statement the pages ran (scale data);
 *   2. load: the server without counting, autocannon per target (scripts/bench/load.ts).
 *
 * Flags: BENCH_SECONDS (per run, default 10), BENCH_RATE (fixed rate, default 20 req/s),
 * BENCH_PORT (3290), BENCH_DIST_DIR (.next-bench), BENCH_REBUILD=1, BENCH_ONLY=key,key (a subset
 * of targets; docs/benchmarks.md is then not written), BENCH_LOAD=0 (queries, EXPLAIN and
 * first-load JS only), DB_PORT.
 */
import { spawnSync } from "node:child_process";
import { writeFileSync } from "node:fs";
import os from "node:os";
import { join } from "node:path";
import mysql from "mysql2/promise";
import { DEMO_PASSWORD, DEMO_USERS } from "../../db/demo-data";
import { SCALE_PASSWORD, scaleEmail } from "../scale/generate";
import { explainAll, type Explained } from "./explain";
import { buildRoutes, fillRoute, firstLoadJs } from "./first-load";
import { measure } from "./load";
import { sample, type Statement } from "./queries";
import { diffStatements, markdown, printTable, type FirstLoad, type Machine, type QueryDiff, type Row } from "./report";
import { DIST_DIR, ensureBuild, ROOT, startServer } from "./server";
import { resolveIds, signIn, targets, type Target } from "./targets";

const DB_PORT = process.env.DB_PORT ?? "3407";
const appUrl = (db: string) => `mysql://presswright_app:${process.env.DB_APP_PASSWORD ?? "presswright-dev-only"}@127.0.0.1:${DB_PORT}/${db}`;
const migrateUrl = (db: string) => `mysql://presswright_migrate:${process.env.DB_MIGRATE_PASSWORD ?? "presswright-migrate-dev-only"}@127.0.0.1:${DB_PORT}/${db}`;
const SECONDS = Number(process.env.BENCH_SECONDS ?? 10);
const RATE = Number(process.env.BENCH_RATE ?? 20);
const ONLY = process.env.BENCH_ONLY?.split(",").filter(Boolean);

const DATASETS = {
  demo: { db: "presswright", email: DEMO_USERS.find((u) => u.key === "manager")!.email, password: DEMO_PASSWORD },
  scale: { db: "presswright_scale", email: scaleEmail(0, "manager"), password: SCALE_PASSWORD },
};

async function scalar(db: string, sql: string): Promise<string> {
  const connection = await mysql.createConnection({ uri: migrateUrl(db) });
  try {
    const [rows] = await connection.query<mysql.RowDataPacket[]>(sql);
    return String(Object.values(rows[0] ?? {})[0] ?? "");
  } finally {
    await connection.end();
  }
}

/** The demo database, migrated and seeded (the seed does nothing when it already has users). */
function ensureDemoData(): void {
  const env = { ...process.env, MIGRATE_DATABASE_URL: migrateUrl("presswright") };
  for (const args of [["tsx", "scripts/migrate.ts"], ["tsx", "db/seed.ts", "--quiet"]]) {
    const step = spawnSync("npx", args, { cwd: ROOT, env, stdio: "inherit" });
    if (step.status !== 0) throw new Error(`${args.join(" ")} failed`);
  }
}

type Counted = { queries: Map<string, number>; statements: Map<string, Statement[]>; firstLoad: FirstLoad[] };

async function countQueries(name: keyof typeof DATASETS, list: (ids: Awaited<ReturnType<typeof resolveIds>>) => Target[], withFirstLoad: boolean): Promise<Counted> {
  const dataset = DATASETS[name];
  const ids = await resolveIds(migrateUrl(dataset.db), dataset.email);
  const server = await startServer(appUrl(dataset.db), "sql");
  const out: Counted = { queries: new Map(), statements: new Map(), firstLoad: [] };
  try {
    const cookie = await signIn(server.base, dataset.email, dataset.password);
    for (const target of list(ids)) {
      const s = await sample(server, cookie, target, `${name}:${target.key}`);
      if (s.status >= 300) console.log(`bench: ${name} ${target.method} ${target.path} answered ${s.status}`);
      out.queries.set(target.key, s.queries);
      out.statements.set(target.key, s.statements);
    }
    if (withFirstLoad) {
      for (const route of buildRoutes(ROOT, DIST_DIR)) {
        if (route === "/_global-error" || route.startsWith("/dev/")) continue; // never served as a page in production
        const url = route === "/_not-found" ? "/no-such-page" : fillRoute(route, ids.segments);
        if (!url) {
          out.firstLoad.push({ route, url: null, gzipBytes: null, status: null });
          continue;
        }
        const res = await fetch(server.base + url, { headers: { cookie } });
        const html = await res.text();
        const served = res.ok || (route === "/_not-found" && res.status === 404);
        out.firstLoad.push({ route, url, status: res.status, gzipBytes: served ? (await firstLoadJs(server.base, html)).totalGzipBytes : null });
      }
    }
  } finally {
    await server.stop();
  }
  return out;
}

/** Phase 2: autocannon per target against the server without query counting. */
async function loadRuns(list: Target[], demo: Counted, scale: Counted): Promise<Row[]> {
  const server = await startServer(appUrl("presswright_scale"));
  const rows: Row[] = [];
  try {
    const cookie = await signIn(server.base, DATASETS.scale.email, DATASETS.scale.password);
    for (const target of list) {
      // A fresh sizing limit window for the sizing runs (the limit itself is what it measures after 120 requests).
      if (target.key === "sizing-api") await scalar("presswright_scale", "DELETE FROM rate_limit_windows").catch(() => "");
      process.stdout.write(`  ${target.key} … `);
      const load = await measure(server.base, cookie, target, SECONDS, RATE);
      console.log(`${load.c10.reqPerS.toFixed(1)} req/s`);
      rows.push({ target, load, queriesDemo: demo.queries.get(target.key), queriesScale: scale.queries.get(target.key) });
    }
  } finally {
    await server.stop();
  }
  return rows;
}

async function main(): Promise<void> {
  const started = Date.now();
  if (Number(await scalar("presswright_scale", "SELECT COUNT(*) FROM inspections").catch(() => "0")) === 0) {
    throw new Error("The scale database is empty: run `npm run seed:scale` first.");
  }
  ensureBuild();
  ensureDemoData();
  const machine: Machine = {
    date: new Date().toISOString(),
    cpus: os.cpus().length,
    cpuModel: os.cpus()[0]?.model.trim() ?? "unknown",
    memoryGb: os.totalmem() / 1e9,
    loadAverage: os.loadavg(),
    node: process.version,
    mariadb: await scalar("presswright_scale", "SELECT VERSION()"),
  };
  const pick = (ids: Awaited<ReturnType<typeof resolveIds>>) => targets(ids).filter((t) => !ONLY || ONLY.includes(t.key));

  console.log("bench: counting queries on the demo data …");
  const demo = await countQueries("demo", pick, false);
  console.log("bench: counting queries on the scale data, first-load JS of every route …");
  const scale = await countQueries("scale", pick, !ONLY);
  const explained: Explained[] = await explainAll(migrateUrl("presswright_scale"), scale.statements);
  const diffs = [...scale.statements.keys()].map((key) => diffStatements(key, demo.statements.get(key) ?? [], scale.statements.get(key) ?? [])).filter((d): d is QueryDiff => d !== null);

  const ids = await resolveIds(migrateUrl("presswright_scale"), DATASETS.scale.email);
  const rows: Row[] = [];
  if (process.env.BENCH_LOAD === "0") {
    for (const target of pick(ids)) rows.push({ target, queriesDemo: demo.queries.get(target.key), queriesScale: scale.queries.get(target.key) });
  } else {
    console.log(`bench: load runs, ${SECONDS} s each …`);
    rows.push(...(await loadRuns(pick(ids), demo, scale)));
  }

  console.log("");
  printTable(rows);
  const flagged = explained.filter((e) => e.flag);
  console.log(`\nEXPLAIN: ${explained.length} statements, ${flagged.length} flagged${flagged.map((e) => `\n  ${e.flag}: ${e.sql.slice(0, 140)}`).join("")}`);
  for (const d of diffs) console.log(`queries differ on ${d.key}:${d.statements.map((st) => `\n  ${st.demo} → ${st.scale}: ${st.sql.slice(0, 140)}`).join("")}`);
  for (const f of scale.firstLoad) console.log(`first-load JS ${f.route}: ${f.gzipBytes === null ? (f.url ? `HTTP ${f.status}` : "not measured") : `${(f.gzipBytes / 1000).toFixed(1)} kB`}`);
  if (ONLY || process.env.BENCH_LOAD === "0") {
    console.log("\nBENCH_ONLY or BENCH_LOAD=0 set: docs/benchmarks.md left as it was.");
  } else {
    writeFileSync(join(ROOT, "docs/benchmarks.md"), markdown(machine, { seconds: SECONDS, rate: RATE }, rows, scale.firstLoad, explained, diffs));
    console.log("\nWrote docs/benchmarks.md");
  }
  console.log(`bench: done in ${((Date.now() - started) / 1000).toFixed(0)} s`);
}

await main();
