import { sql } from "drizzle-orm";
import { index, mysqlEnum, mysqlTable, varchar } from "drizzle-orm/mysql-core";
import { users } from "./auth";
import { ID_LENGTH, utc } from "./columns";
import { presses } from "./presses";

/** Why a press was tagged out: a failed critical inspection item, a stop-use problem report, or by hand. */
export const TAG_OUT_SOURCES = ["inspection", "problem", "manual"] as const;
export type TagOutSource = (typeof TAG_OUT_SOURCES)[number];

/**
 * Tag-outs of a press. A press is tagged out while any row has no `cleared_at`; clearing keeps the
 * row with who cleared it and why (a passing re-inspection, a closed problem report, or a reason).
 */
export const pressTagOuts = mysqlTable(
  "press_tag_outs",
  {
    id: varchar("id", { length: ID_LENGTH }).primaryKey(),
    pressId: varchar("press_id", { length: ID_LENGTH })
      .notNull()
      .references(() => presses.id, { onDelete: "cascade" }),
    source: mysqlEnum("source", TAG_OUT_SOURCES).notNull(),
    /** The inspection or problem report that caused it; null for a manual tag-out. */
    sourceId: varchar("source_id", { length: ID_LENGTH }),
    reason: varchar("reason", { length: 500 }).notNull(),
    taggedBy: varchar("tagged_by", { length: ID_LENGTH }).references(() => users.id, { onDelete: "set null" }),
    taggedAt: utc("tagged_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    clearedAt: utc("cleared_at"),
    clearedBy: varchar("cleared_by", { length: ID_LENGTH }).references(() => users.id, { onDelete: "set null" }),
    clearReason: varchar("clear_reason", { length: 500 }),
  },
  (t) => [index("press_tag_outs_open_idx").on(t.pressId, t.clearedAt), index("press_tag_outs_source_idx").on(t.sourceId)],
);
