// Opt-in SQL query counting for the benchmark (npm run bench), off unless
// PRESSWRIGHT_QUERY_COUNT is set: "1" prints one line per request with its query count,
// "sql" also prints every statement with its parameters (the benchmark EXPLAINs them).
// Each request runs in an AsyncLocalStorage store that db/client.ts finds on globalThis and
// counts into through Drizzle's logger; with the flag unset neither exists, so it costs nothing.
import { AsyncLocalStorage } from "node:async_hooks";

export const QUERY_COUNT_STORE = Symbol.for("presswright.queryCount");

/** Wraps a node:http handler so each request's queries are counted and printed when it finishes. */
export function countQueriesPerRequest(handler) {
  const mode = process.env.PRESSWRIGHT_QUERY_COUNT;
  if (mode !== "1" && mode !== "sql") return handler;
  const store = new AsyncLocalStorage();
  globalThis[QUERY_COUNT_STORE] = store;
  return (req, res) => {
    const counter = { count: 0, statements: mode === "sql" ? [] : undefined };
    res.on("finish", () => {
      const line = { method: req.method, url: req.url, status: res.statusCode, tag: req.headers["x-bench-tag"] ?? null, queries: counter.count, statements: counter.statements };
      process.stdout.write(`[query-count] ${JSON.stringify(line)}\n`);
    });
    store.run(counter, () => handler(req, res));
  };
}
