import { sql } from "drizzle-orm";
import { boolean, index, mysqlEnum, mysqlTable, varchar } from "drizzle-orm/mysql-core";
import { users } from "./auth";
import { ID_LENGTH, utc } from "./columns";
import { presses } from "./presses";
import { serviceEntries } from "./service";

export const PROBLEM_SEVERITIES = ["low", "medium", "high"] as const;
export type ProblemSeverity = (typeof PROBLEM_SEVERITIES)[number];

/**
 * A problem a member found on a press. `stopUse` tags the press out (press_tag_outs, source
 * "problem") in the same transaction; closing the report clears that tag-out. A report is closed
 * with a service-log entry of the same press or a reason.
 */
export const problemReports = mysqlTable(
  "problem_reports",
  {
    id: varchar("id", { length: ID_LENGTH }).primaryKey(),
    pressId: varchar("press_id", { length: ID_LENGTH })
      .notNull()
      .references(() => presses.id, { onDelete: "cascade" }),
    description: varchar("description", { length: 1000 }).notNull(),
    severity: mysqlEnum("severity", PROBLEM_SEVERITIES).notNull(),
    stopUse: boolean("stop_use").notNull().default(false),
    reportedBy: varchar("reported_by", { length: ID_LENGTH }).references(() => users.id, { onDelete: "set null" }),
    reportedAt: utc("reported_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    closedAt: utc("closed_at"),
    closedBy: varchar("closed_by", { length: ID_LENGTH }).references(() => users.id, { onDelete: "set null" }),
    closeReason: varchar("close_reason", { length: 500 }),
    serviceEntryId: varchar("service_entry_id", { length: ID_LENGTH }).references(() => serviceEntries.id, { onDelete: "set null" }),
  },
  (t) => [index("problem_reports_press_idx").on(t.pressId, t.closedAt, t.reportedAt)],
);
