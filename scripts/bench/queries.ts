/**
 * SQL queries per request: one request per target against a server started with
 * PRESSWRIGHT_QUERY_COUNT=sql, matched to the server's `[query-count]` line by the x-bench-tag header.
 */
import type { RunningServer } from "./server";
import { requestHeaders, type Target } from "./targets";

export type Statement = { sql: string; params: unknown[] };
export type Sample = { status: number; queries: number; statements: Statement[]; html: string };

type CountLine = { tag: string | null; status: number; queries: number; statements?: Statement[] };

function findLine(lines: string[], tag: string): CountLine | undefined {
  for (const line of lines) {
    if (!line.startsWith("[query-count] ")) continue;
    const parsed = JSON.parse(line.slice("[query-count] ".length)) as CountLine;
    if (parsed.tag === tag) return parsed;
  }
  return undefined;
}

export async function sample(server: RunningServer, cookie: string, target: Target, tag: string): Promise<Sample> {
  const res = await fetch(server.base + target.path, { method: target.method, body: target.body, headers: { ...requestHeaders(target, server.base, cookie), "x-bench-tag": tag }, redirect: "manual" });
  const html = await res.text();
  const deadline = Date.now() + 10_000;
  for (;;) {
    const line = findLine(server.lines, tag);
    if (line) return { status: res.status, queries: line.queries, statements: line.statements ?? [], html };
    if (Date.now() > deadline) throw new Error(`no [query-count] line for ${target.path} (is PRESSWRIGHT_QUERY_COUNT on?)`);
    await new Promise((r) => setTimeout(r, 50));
  }
}
