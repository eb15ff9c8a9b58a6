import { sql } from "drizzle-orm";
import { index, int, mysqlEnum, mysqlTable, varchar } from "drizzle-orm/mysql-core";
import { users } from "./auth";
import { ID_LENGTH, utc } from "./columns";
import { components } from "./components";
import { inspectionAnswers } from "./inspections";
import { presses } from "./presses";
import { serviceEntries } from "./service";
import { problemReports } from "./problems";

export const PHOTO_KINDS = ["weld", "leak", "damage", "die", "other"] as const;

/**
 * A photo after the server re-encoded it (no EXIF/GPS left) — the original upload is deleted, so
 * only these two stored files exist. It always belongs to a press and optionally to one record on
 * it: a part, a service-log entry, an inspection answer or a problem report.
 */
export const photos = mysqlTable(
  "photos",
  {
    id: varchar("id", { length: ID_LENGTH }).primaryKey(),
    pressId: varchar("press_id", { length: ID_LENGTH })
      .notNull()
      .references(() => presses.id, { onDelete: "cascade" }),
    componentId: varchar("component_id", { length: ID_LENGTH }).references(() => components.id, { onDelete: "set null" }),
    serviceEntryId: varchar("service_entry_id", { length: ID_LENGTH }).references(() => serviceEntries.id, { onDelete: "set null" }),
    inspectionItemId: varchar("inspection_item_id", { length: ID_LENGTH }).references(() => inspectionAnswers.id, { onDelete: "set null" }),
    problemReportId: varchar("problem_report_id", { length: ID_LENGTH }).references(() => problemReports.id, { onDelete: "set null" }),
    kind: mysqlEnum("kind", PHOTO_KINDS).notNull().default("other"),
    caption: varchar("caption", { length: 200 }),
    uploadedBy: varchar("uploaded_by", { length: ID_LENGTH }).references(() => users.id, { onDelete: "set null" }),
    fileKey: varchar("file_key", { length: 128 }).notNull(),
    fileUrl: varchar("file_url", { length: 512 }).notNull(),
    width: int("width").notNull(),
    height: int("height").notNull(),
    bytes: int("bytes").notNull(),
    thumbKey: varchar("thumb_key", { length: 128 }).notNull(),
    thumbUrl: varchar("thumb_url", { length: 512 }).notNull(),
    thumbWidth: int("thumb_width").notNull(),
    thumbHeight: int("thumb_height").notNull(),
    thumbBytes: int("thumb_bytes").notNull(),
    createdAt: utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index("photos_press_idx").on(t.pressId, t.createdAt), index("photos_component_idx").on(t.componentId)],
);
