import "server-only";
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

export const db: Database = drizzle(pool, { schema, mode: "default" });
