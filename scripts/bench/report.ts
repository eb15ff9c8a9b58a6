/** The benchmark's printed table and docs/benchmarks.md. */
import type { Explained } from "./explain";
import type { LoadFigures, TargetFigures } from "./load";
import type { Target } from "./targets";

export type Machine = { date: string; cpus: number; cpuModel: string; memoryGb: number; loadAverage: number[]; node: string; mariadb: string };
export type Row = { target: Target; load?: TargetFigures; queriesDemo?: number; queriesScale?: number; statusScale?: number };
/** For a target whose query count differs: statements whose count differs, demo → scale. */
export type QueryDiff = { key: string; statements: { sql: string; demo: number; scale: number }[] };
export type FirstLoad = { route: string; url: string | null; gzipBytes: number | null; status: number | null };
export type Settings = { seconds: number; rate: number };

/** Throughputs the issue measured before the public pages were prerendered (demo data, 2 cores). */
const OLD_PUBLIC_REQ_S: Record<string, number> = { landing: 97, sizing: 70 };

const f0 = (n: number) => n.toFixed(0);
const f1 = (n: number) => n.toFixed(1);
const ms = (n: number) => `${f0(n)}`;
/** p-values of a run, or a dash when no request finished within it. */
const ps = (l: LoadFigures, keys: ("p50" | "p90" | "p99")[], sep: string) => (l.requests === 0 ? "no answer in the run" : keys.map((k) => ms(l[k])).join(sep));
const kb = (bytes: number) => `${f1(bytes / 1000)}`;
const errorRate = (l: LoadFigures) => (l.requests + l.errors > 0 ? ((l.non2xx + l.errors) / (l.requests + l.errors)) * 100 : 0);

function ratio(row: Row, floor: number): number | null {
  return row.load && floor > 0 ? row.load.c10.reqPerS / floor : null;
}

/** The issue's target for a row and whether this run meets it. */
function goal(row: Row, floor: number): { text: string; met: boolean | null } {
  const r = ratio(row, floor);
  if (row.target.kind === "signed-in page") return { text: "≥ 0.6× floor", met: r === null ? null : r >= 0.6 };
  if (row.target.kind === "public") {
    const old = OLD_PUBLIC_REQ_S[row.target.key];
    if (old) return { text: `≥ 5× ${old} = ${5 * old} req/s (prerendered)`, met: row.load ? row.load.c10.reqPerS >= 5 * old : null };
    if (row.target.key === "sign-in") return { text: "prerendered (≥ 5× its old throughput; compare the 404 page)", met: null };
    return { text: row.target.key === "not-found" ? "reference (prerendered)" : "—", met: null };
  }
  return { text: "baseline", met: null };
}

const verdict = (met: boolean | null) => (met === null ? "" : met ? "met" : "**not met**");

export function printTable(rows: Row[]): void {
  const floor = rows.find((r) => r.target.kind === "floor")?.load?.c10.reqPerS ?? 0;
  const head = ["target", "req/s@10", "×floor", "p50/p90/p99@1 ms", "p50/p90/p99@10 ms", "p50/p99@R ms", "err %", "kB/resp", "SQL demo→scale"];
  const lines = rows.map((row) => {
    const l = row.load;
    const r = ratio(row, floor);
    return [
      row.target.key,
      l ? f1(l.c10.reqPerS) : "-",
      r === null ? "-" : r.toFixed(2),
      l ? ps(l.c1, ["p50", "p90", "p99"], "/") : "-",
      l ? ps(l.c10, ["p50", "p90", "p99"], "/") : "-",
      l ? ps(l.fixed, ["p50", "p99"], "/") : "-",
      l ? f1(errorRate(l.c10)) : "-",
      l ? kb(l.c10.bytesPerResponse) : "-",
      `${row.queriesDemo ?? "-"}→${row.queriesScale ?? "-"}`,
    ];
  });
  const widths = head.map((h, i) => Math.max(h.length, ...lines.map((l) => l[i]!.length)));
  const fmt = (cells: string[]) => cells.map((c, i) => (i === 0 ? c.padEnd(widths[i]!) : c.padStart(widths[i]!))).join("  ");
  console.log(fmt(head));
  for (const l of lines) console.log(fmt(l));
}

export function markdown(machine: Machine, settings: Settings, rows: Row[], firstLoad: FirstLoad[], explained: Explained[], diffs: QueryDiff[]): string {
  const floor = rows.find((r) => r.target.kind === "floor")?.load?.c10.reqPerS ?? 0;
  const out: string[] = [];
  out.push("# Benchmarks", "");
  out.push("Written by `npm run bench` (scripts/bench/); do not edit by hand — rerun it. One run, all targets side by side.", "");
  out.push(`- Date: ${machine.date}`);
  out.push(`- Machine: ${machine.cpus} CPUs (${machine.cpuModel}), ${f1(machine.memoryGb)} GB memory, load average at start ${machine.loadAverage.map(f1).join(" / ")} (1/5/15 min)`);
  out.push(`- Node.js ${machine.node}, MariaDB ${machine.mariadb}`);
  out.push(`- Data: the scale data set (\`npm run seed:scale\`: 50 shops, 500 presses, 100,000 service entries, 20,000 signed inspections, 50,000 bookings), signed in as the shop-1 manager; the press with the longest history has 60 parts, 5,000 hour-meter readings, 5,000 service entries and 500 inspections.`);
  out.push(`- Load: autocannon, ${settings.seconds} s per run: closed loop at 1 and 10 connections, and open loop at a fixed ${settings.rate} req/s (\`-R ${settings.rate}\`, 10 connections) for the reliability doc's headline. Latency in ms.`);
  out.push("");
  out.push("## Throughput and latency", "");
  out.push("| target | path | req/s @10 | × floor | target | p50 / p90 / p99 @1 | p50 / p90 / p99 @10 | p50 / p99 @ fixed rate | errors @10 (non-2xx + errors) | kB per response |");
  out.push("|---|---|---:|---:|---|---|---|---|---:|---:|");
  for (const row of rows) {
    const l = row.load;
    const r = ratio(row, floor);
    const g = goal(row, floor);
    out.push(
      `| ${row.target.label} | \`${row.target.method} ${row.target.path}\` | ${l ? f1(l.c10.reqPerS) : "-"} | ${r === null ? "-" : r.toFixed(2)} | ${g.text} ${verdict(g.met)} | ${l ? ps(l.c1, ["p50", "p90", "p99"], " / ") : "-"} | ${l ? ps(l.c10, ["p50", "p90", "p99"], " / ") : "-"} | ${l ? `${ps(l.fixed, ["p50", "p99"], " / ")} (${f1(errorRate(l.fixed))} % err)` : "-"} | ${l ? `${f1(errorRate(l.c10))} % (${l.c10.non2xx} + ${l.c10.errors} of ${l.c10.requests})` : "-"} | ${l ? kb(l.c10.bytesPerResponse) : "-"} |`,
    );
  }
  out.push("", "`POST /api/sizing` is limited to 120 requests a minute per address (lib/rate-limit.ts). Its load comes from a different `X-Forwarded-For` address on every request (the bench server trusts one proxy hop), so the figures are the whole path — the limiter's window write and the computation — as many visitors would meet it, not the limiter's refusals.");
  out.push("", "## SQL queries per request (demo data → scale data; target: equal)", "");
  out.push("Counted with `PRESSWRIGHT_QUERY_COUNT=1` (db/client.ts, scripts/lib/query-count.mjs), one request per page, the demo manager on the demo data and the shop-1 manager on the scale data.", "");
  out.push("| target | demo | scale | equal |", "|---|---:|---:|---|");
  for (const row of rows) {
    const equal = row.queriesDemo === row.queriesScale;
    out.push(`| ${row.target.label} | ${row.queriesDemo ?? "-"} | ${row.queriesScale ?? "-"} | ${equal ? "yes" : "**no**"} |`);
  }
  for (const diff of diffs) {
    out.push("", `Statements of \`${diff.key}\` whose count differs (demo → scale):`, "");
    for (const st of diff.statements) out.push(`- ${st.demo} → ${st.scale}: \`${st.sql.replace(/\s+/g, " ").slice(0, 200)}\``);
  }
  out.push("", `## First-load JavaScript per route (gzip -9; target ≤ 200 kB)`, "");
  out.push("Every page route of the build (app-path-routes-manifest.json), dynamic segments filled from the scale data, fetched signed in; the sum of every script chunk the HTML references (noModule polyfills not counted).", "");
  out.push("| route | first-load JS | target |", "|---|---:|---|");
  for (const f of firstLoad) {
    const size = f.gzipBytes === null ? (f.url === null ? "not measured (no value for a segment)" : `HTTP ${f.status}`) : `${kb(f.gzipBytes)} kB`;
    out.push(`| \`${f.route}\` | ${size} | ${f.gzipBytes === null ? "" : f.gzipBytes <= 200_000 ? "met" : "**not met**"} |`);
  }
  out.push("", "## EXPLAIN of the measured pages' queries (scale data)", "");
  out.push("Every distinct SELECT/UPDATE/DELETE the measured pages ran, explained on the scale database. Flagged: a full table or index scan, or a filesort, over more than 1,000 rows.", "");
  const flagged = explained.filter((e) => e.flag);
  out.push(`${explained.length} statements, ${flagged.length} flagged. "rows" is MariaDB's estimate before any LIMIT: a range on an index read in order stops at the limit.`, "");
  out.push("| statement | pages | access (table: type, key, rows) | flag |", "|---|---|---|---|");
  for (const e of [...flagged, ...explained.filter((x) => !x.flag)]) {
    const sql = e.sql.replace(/\s+/g, " ").replace(/\|/g, "\\|");
    const access = e.accesses.map((a) => `${a.table}: ${a.type}, ${a.key ?? "no key"}, ${a.rows}`).join("; ");
    out.push(`| \`${sql.length > 180 ? `${sql.slice(0, 180)}…` : sql}\` | ${e.pages.join(", ")} | ${access} | ${e.flag ?? ""} |`);
  }
  out.push("");
  return out.join("\n");
}

/** Which statements make two query counts differ (by SQL text). */
export function diffStatements(key: string, demo: { sql: string }[], scale: { sql: string }[]): QueryDiff | null {
  // `in (?, ?, ?)` lists differ in length between data sets without being another query.
  const shape = (sql: string) => sql.replace(/\(\?(, \?)*\)/g, "(?…)");
  const tally = new Map<string, { demo: number; scale: number }>();
  for (const st of demo.map((x) => shape(x.sql))) tally.set(st, { demo: (tally.get(st)?.demo ?? 0) + 1, scale: tally.get(st)?.scale ?? 0 });
  for (const st of scale.map((x) => shape(x.sql))) tally.set(st, { demo: tally.get(st)?.demo ?? 0, scale: (tally.get(st)?.scale ?? 0) + 1 });
  const statements = [...tally].filter(([, n]) => n.demo !== n.scale).map(([sql, n]) => ({ sql, ...n }));
  return statements.length > 0 ? { key, statements } : null;
}
