import { int, mysqlTable, primaryKey, varchar } from "drizzle-orm/mysql-core";
import { utc } from "./columns";

/** Fixed-window request counters (e.g. the public sizing API per IP), shared by every app instance. */
export const rateLimitWindows = mysqlTable(
  "rate_limit_windows",
  {
    bucket: varchar("bucket", { length: 128 }).notNull(),
    windowStart: utc("window_start").notNull(),
    hits: int("hits").notNull().default(0),
  },
  (t) => [primaryKey({ columns: [t.bucket, t.windowStart] })],
);
