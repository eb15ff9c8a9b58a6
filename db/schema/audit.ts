import { sql } from "drizzle-orm";
import { bigint, index, mysqlTable, varchar } from "drizzle-orm/mysql-core";
import { ID_LENGTH, jsonColumn, utc } from "./columns";

/** Append-only trail of sign-ins, denials and sign-offs; a trigger refuses UPDATE and DELETE. */
export const auditLog = mysqlTable(
  "audit_log",
  {
    id: bigint("id", { mode: "number", unsigned: true }).autoincrement().primaryKey(),
    at: utc("at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    action: varchar("action", { length: 64 }).notNull(),
    userId: varchar("user_id", { length: ID_LENGTH }),
    shopId: varchar("shop_id", { length: ID_LENGTH }),
    ip: varchar("ip", { length: 64 }),
    detail: jsonColumn<Record<string, string | number | boolean | null>>("detail"),
  },
  (t) => [index("audit_user_idx").on(t.userId), index("audit_at_idx").on(t.at)],
);
