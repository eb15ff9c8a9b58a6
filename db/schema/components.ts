import { sql } from "drizzle-orm";
import { bigint, boolean, date, double, index, int, mysqlEnum, mysqlTable, varchar } from "drizzle-orm/mysql-core";
import type { ComponentSpec } from "@/lib/validation/component-spec";
import { users } from "./auth";
import { ID_LENGTH, jsonColumn, utc } from "./columns";
import { presses } from "./presses";

export const COMPONENT_KINDS = [
  "frame-member",
  "crosshead",
  "bolster",
  "platen",
  "cylinder",
  "pump",
  "motor",
  "directional-valve",
  "relief-valve",
  "hose",
  "filter",
  "reservoir",
  "gauge",
  "die",
] as const;

/**
 * A part of a press. Its kind-specific figures live in `spec` (SI, validated by the zod
 * discriminated union in lib/validation/component-spec.ts). Replacing a part never deletes it: the
 * old row gets `removedOn`, a reason and `replacedById`, so the press's history stays whole.
 */
export const components = mysqlTable(
  "components",
  {
    id: varchar("id", { length: ID_LENGTH }).primaryKey(),
    pressId: varchar("press_id", { length: ID_LENGTH })
      .notNull()
      .references(() => presses.id, { onDelete: "cascade" }),
    kind: mysqlEnum("kind", COMPONENT_KINDS).notNull(),
    label: varchar("label", { length: 100 }).notNull(),
    spec: jsonColumn<ComponentSpec>("spec").notNull(),
    maker: varchar("maker", { length: 100 }),
    partNumber: varchar("part_number", { length: 100 }),
    supplier: varchar("supplier", { length: 100 }),
    /** Price in the shop's currency, minor units (cents), to avoid float money. */
    costCents: int("cost_cents"),
    /** For presses being planned or built: has this part been bought yet? */
    purchased: boolean("purchased").notNull().default(true),
    installedOn: date("installed_on", { mode: "string" }),
    removedOn: date("removed_on", { mode: "string" }),
    removalReason: varchar("removal_reason", { length: 255 }),
    replacedById: varchar("replaced_by_id", { length: ID_LENGTH }),
    createdAt: utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    updatedAt: utc("updated_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index("components_press_idx").on(t.pressId, t.removedOn)],
);

export const HOUR_ENTRY_KINDS = ["reading", "correction"] as const;

/**
 * Hour-meter readings: a log of its own that never goes backwards (checked under a row lock).
 * A manager's correction is an entry of its own (kind "correction", with who and why) that voids
 * the wrong readings above it (`voided_by` = the correction's id): they stay in the history, and
 * the entries that are not voided stay monotonic.
 */
export const hourMeterReadings = mysqlTable(
  "hour_meter_readings",
  {
    id: bigint("id", { mode: "number", unsigned: true }).autoincrement().primaryKey(),
    pressId: varchar("press_id", { length: ID_LENGTH })
      .notNull()
      .references(() => presses.id, { onDelete: "cascade" }),
    hours: double("hours").notNull(),
    readAt: utc("read_at").notNull(),
    recordedBy: varchar("recorded_by", { length: ID_LENGTH }).references(() => users.id, { onDelete: "set null" }),
    note: varchar("note", { length: 255 }),
    kind: mysqlEnum("kind", HOUR_ENTRY_KINDS).notNull().default("reading"),
    voidedBy: bigint("voided_by", { mode: "number", unsigned: true }),
  },
  (t) => [index("hour_readings_press_idx").on(t.pressId, t.readAt)],
);
