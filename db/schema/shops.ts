import { sql } from "drizzle-orm";
import { boolean, index, mysqlEnum, mysqlTable, primaryKey, varchar } from "drizzle-orm/mysql-core";
import { users } from "./auth";
import { ID_LENGTH, jsonColumn, utc } from "./columns";

/**
 * Opening hours per weekday, Monday first (index 0 = Monday … 6 = Sunday), as minutes after
 * midnight in the shop's time zone; null for a closed day.
 */
export type OpeningHours = ({ opens: number; closes: number } | null)[];

export const ROLES = ["manager", "inspector", "member"] as const;

export const shops = mysqlTable("shops", {
  id: varchar("id", { length: ID_LENGTH }).primaryKey(),
  name: varchar("name", { length: 100 }).notNull(),
  /** IANA zone; times are stored in UTC and shown in this zone. */
  timeZone: varchar("time_zone", { length: 64 }).notNull().default("UTC"),
  /** ISO 4217 code for part costs. */
  currency: varchar("currency", { length: 3 }).notNull().default("USD"),
  /** Created at sign-up for a home builder; never offered for deletion. */
  personal: boolean("personal").notNull().default(false),
  /** When set, bookings must fall inside these hours; null means any time. */
  openingHours: jsonColumn<OpeningHours>("opening_hours"),
  createdAt: utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
});

export const memberships = mysqlTable(
  "memberships",
  {
    shopId: varchar("shop_id", { length: ID_LENGTH })
      .notNull()
      .references(() => shops.id, { onDelete: "cascade" }),
    userId: varchar("user_id", { length: ID_LENGTH })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    role: mysqlEnum("role", ROLES).notNull(),
    createdAt: utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [primaryKey({ columns: [t.shopId, t.userId] }), index("memberships_user_idx").on(t.userId)],
);
