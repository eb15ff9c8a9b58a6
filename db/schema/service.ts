import { sql } from "drizzle-orm";
import { bigint, boolean, date, double, index, int, mysqlEnum, mysqlTable, text, varchar } from "drizzle-orm/mysql-core";
import { users } from "./auth";
import { ID_LENGTH, jsonColumn, utc } from "./columns";
import { components } from "./components";
import { presses } from "./presses";

/** What a service-log entry records; a plan task names the kind that completes it. */
export const SERVICE_KINDS = [
  "hose-replaced",
  "filter-changed",
  "oil-changed",
  "oil-topped-up",
  "oil-sample",
  "relief-checked",
  "leak-fixed",
  "weld-repaired",
  "die-changed",
  "other",
] as const;
export type ServiceKind = (typeof SERVICE_KINDS)[number];

/** One part used in a service entry; `componentId` links it to the press's parts when known. */
export type ServicePart = { description: string; quantity: number; componentId?: string | null };

/**
 * The service log: what was done to a press, when (the shop's local date), at which hour-meter
 * reading, with which parts, at what cost and by whom. Corrections are kept in
 * `service_entry_revisions`, so the entry shows its latest state and its history stays whole.
 */
export const serviceEntries = mysqlTable(
  "service_entries",
  {
    id: varchar("id", { length: ID_LENGTH }).primaryKey(),
    pressId: varchar("press_id", { length: ID_LENGTH })
      .notNull()
      .references(() => presses.id, { onDelete: "cascade" }),
    kind: mysqlEnum("kind", SERVICE_KINDS).notNull(),
    performedOn: date("performed_on", { mode: "string" }).notNull(),
    hours: double("hours"),
    parts: jsonColumn<ServicePart[]>("parts").notNull(),
    /** The part this entry acted on (for a hose replacement: the hose taken off). */
    componentId: varchar("component_id", { length: ID_LENGTH }).references(() => components.id, { onDelete: "set null" }),
    /** The part installed by this entry (a replacement recorded in the same transaction). */
    installedComponentId: varchar("installed_component_id", { length: ID_LENGTH }).references(() => components.id, { onDelete: "set null" }),
    costCents: int("cost_cents"),
    /** ISO 4406 code as written, e.g. "18/16/13" (oil samples only). */
    iso4406: varchar("iso4406", { length: 8 }),
    reliefFoundBar: double("relief_found_bar"),
    reliefSetBar: double("relief_set_bar"),
    notes: text("notes"),
    performedBy: varchar("performed_by", { length: ID_LENGTH }).references(() => users.id, { onDelete: "set null" }),
    createdAt: utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    updatedAt: utc("updated_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index("service_entries_press_idx").on(t.pressId, t.performedOn, t.id), index("service_entries_press_kind_idx").on(t.pressId, t.kind, t.performedOn)],
);

/** Audit of corrections to a service entry: which fields changed, from what to what, by whom, when. */
export const serviceEntryRevisions = mysqlTable(
  "service_entry_revisions",
  {
    id: bigint("id", { mode: "number", unsigned: true }).autoincrement().primaryKey(),
    entryId: varchar("entry_id", { length: ID_LENGTH })
      .notNull()
      .references(() => serviceEntries.id, { onDelete: "cascade" }),
    changedBy: varchar("changed_by", { length: ID_LENGTH }).references(() => users.id, { onDelete: "set null" }),
    changedAt: utc("changed_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    changes: jsonColumn<Record<string, { from: unknown; to: unknown }>>("changes").notNull(),
  },
  (t) => [index("service_entry_revisions_entry_idx").on(t.entryId, t.changedAt)],
);

/**
 * A recurring task of a press's service plan: due every `intervalDays` and/or `intervalHours`,
 * whichever comes first, counted from the last entry of `kind` (or from when the task started).
 */
export const serviceTasks = mysqlTable(
  "service_tasks",
  {
    id: varchar("id", { length: ID_LENGTH }).primaryKey(),
    pressId: varchar("press_id", { length: ID_LENGTH })
      .notNull()
      .references(() => presses.id, { onDelete: "cascade" }),
    title: varchar("title", { length: 100 }).notNull(),
    kind: mysqlEnum("kind", SERVICE_KINDS).notNull(),
    intervalDays: int("interval_days"),
    intervalHours: double("interval_hours"),
    /** Where the interval counts from: the last completing entry, or the task's start. */
    lastDoneOn: date("last_done_on", { mode: "string" }).notNull(),
    lastDoneHours: double("last_done_hours").notNull().default(0),
    lastEntryId: varchar("last_entry_id", { length: ID_LENGTH }),
    /** Offered by the starting plan (common practice), not set by the shop. */
    fromStartingPlan: boolean("from_starting_plan").notNull().default(false),
    createdAt: utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index("service_tasks_press_idx").on(t.pressId, t.kind)],
);
