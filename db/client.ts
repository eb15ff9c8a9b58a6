import "server-only";
import type { AsyncLocalStorage } from "node:async_hooks";
import type { Logger } from "drizzle-orm";
import { drizzle, type MySql2Database } from "drizzle-orm/mysql2";
import mysql from "mysql2/promise";
import { appDatabaseUrl } from "./config";
import * as schema from "./schema";

export type Database = MySql2Database<typeof schema>;

// The one database client of the app. Kept on globalThis so dev reloads reuse the pool.
const globalForDb = globalThis as unknown as { presswrightPool?: mysql.Pool };

function createPool(): mysql.Pool {
  return mysql.createPool({
    uri: appDatabaseUrl(),
    connectionLimit: Number(process.env.DB_POOL_SIZE ?? 10),
    // Every DATETIME we write and read is UTC.
    timezone: "Z",
    dateStrings: false,
    enableKeepAlive: true,
    connectTimeout: 5_000,
  });
}

export const pool: mysql.Pool = globalForDb.presswrightPool ?? createPool();
if (process.env.NODE_ENV !== "production") globalForDb.presswrightPool = pool;

type QueryCounter = { count: number; statements?: { sql: string; params: unknown[] }[] };

/**
 * Benchmark-only query counting (scripts/lib/query-count.mjs puts a per-request store on
 * globalThis when PRESSWRIGHT_QUERY_COUNT is set). Unset, Drizzle gets no logger at all.
 */
function queryCountingLogger(): Logger | undefined {
  if (!process.env.PRESSWRIGHT_QUERY_COUNT) return undefined;
  return {
    logQuery(query, params) {
      const store = (globalThis as Record<symbol, AsyncLocalStorage<QueryCounter> | undefined>)[Symbol.for("presswright.queryCount")];
      const counter = store?.getStore();
      if (!counter) return;
      counter.count += 1;
      counter.statements?.push({ sql: query, params });
    },
  };
}

const logger = queryCountingLogger();
export const db: Database = drizzle(pool, { schema, mode: "default", ...(logger ? { logger } : {}) });
