import { sql } from "drizzle-orm";
import { index, int, mysqlEnum, mysqlTable, primaryKey, varchar } from "drizzle-orm/mysql-core";
import { binary, ID_LENGTH, utc } from "./columns";

export const users = mysqlTable("users", {
  id: varchar("id", { length: ID_LENGTH }).primaryKey(),
  email: varchar("email", { length: 254 }).notNull().unique(),
  displayName: varchar("display_name", { length: 80 }).notNull(),
  passwordHash: varchar("password_hash", { length: 255 }).notNull(),
  unitSystem: mysqlEnum("unit_system", ["metric", "imperial"]).notNull().default("metric"),
  /** The shop the user last switched to; validated against memberships on every read. */
  activeShopId: varchar("active_shop_id", { length: ID_LENGTH }),
  createdAt: utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
});

/** Sessions as the Lucia project's guide teaches: the cookie holds `id.secret`, we keep SHA-256(secret). */
export const sessions = mysqlTable(
  "sessions",
  {
    id: varchar("id", { length: ID_LENGTH }).primaryKey(),
    secretHash: binary("secret_hash", { length: 32 }).notNull(),
    userId: varchar("user_id", { length: ID_LENGTH })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    createdAt: utc("created_at").notNull(),
    lastVerifiedAt: utc("last_verified_at").notNull(),
  },
  (t) => [index("sessions_user_idx").on(t.userId)],
);

/** Failed sign-in counters, per IP and per account; kept in the database so every instance shares them. */
export const loginThrottle = mysqlTable(
  "login_throttle",
  {
    scope: mysqlEnum("scope", ["ip", "account"]).notNull(),
    subject: varchar("subject", { length: 254 }).notNull(),
    failures: int("failures").notNull().default(0),
    lastFailureAt: utc("last_failure_at").notNull(),
    lockedUntil: utc("locked_until"),
  },
  (t) => [primaryKey({ columns: [t.scope, t.subject] })],
);
