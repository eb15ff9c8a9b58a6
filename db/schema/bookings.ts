import { sql } from "drizzle-orm";
import { mysqlTable, varchar } from "drizzle-orm/mysql-core";
import { users } from "./auth";
import { ID_LENGTH, utc } from "./columns";
import { presses } from "./presses";

/*
 * Bookings of a press. NOT re-exported from ./index on purpose: the table is created by the custom
 * migration 0007_bookings_without_overlaps.sql, because drizzle-kit cannot express its
 * application-time period (`PERIOD FOR slot (starts_at, ends_at)`) nor the key
 * `UNIQUE (press_id, slot WITHOUT OVERLAPS)` that makes MariaDB itself refuse overlapping bookings.
 * This definition only types the queries. A cancelled booking is deleted (and audited), so it
 * frees its slot.
 */
export const bookings = mysqlTable("bookings", {
  id: varchar("id", { length: ID_LENGTH }).primaryKey(),
  pressId: varchar("press_id", { length: ID_LENGTH })
    .notNull()
    .references(() => presses.id, { onDelete: "cascade" }),
  userId: varchar("user_id", { length: ID_LENGTH })
    .notNull()
    .references(() => users.id, { onDelete: "cascade" }),
  startsAt: utc("starts_at").notNull(),
  endsAt: utc("ends_at").notNull(),
  createdAt: utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
});
