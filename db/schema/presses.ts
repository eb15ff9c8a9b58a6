import { sql } from "drizzle-orm";
import { double, index, mysqlEnum, mysqlTable, text, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import type { SizingInput } from "@/lib/hydraulics/types";
import { ID_LENGTH, jsonColumn, utc } from "./columns";
import { shops } from "./shops";

export const FRAME_TYPES = ["h-frame", "c-frame", "four-post", "other"] as const;
export const LIFECYCLES = ["planned", "building", "in-service", "retired"] as const;

/** A press's identity and headline figures, all in SI (mm, bar, kN, hours). */
export const presses = mysqlTable(
  "presses",
  {
    id: varchar("id", { length: ID_LENGTH }).primaryKey(),
    shopId: varchar("shop_id", { length: ID_LENGTH })
      .notNull()
      .references(() => shops.id, { onDelete: "cascade" }),
    name: varchar("name", { length: 100 }).notNull(),
    frameType: mysqlEnum("frame_type", FRAME_TYPES).notNull(),
    lifecycle: mysqlEnum("lifecycle", LIFECYCLES).notNull().default("planned"),
    ratedForceKn: double("rated_force_kn"),
    daylightMm: double("daylight_mm"),
    strokeMm: double("stroke_mm"),
    bedWidthMm: double("bed_width_mm"),
    bedDepthMm: double("bed_depth_mm"),
    workingPressureBar: double("working_pressure_bar"),
    reliefPressureBar: double("relief_pressure_bar"),
    hourMeter: double("hour_meter").notNull().default(0),
    location: varchar("location", { length: 100 }),
    notes: text("notes"),
    /** The sizing inputs a planned press was saved from (SI), kept so the plan can be reopened. */
    sizingInput: jsonColumn<SizingInput>("sizing_input"),
    /** Random token of the public status page (/status/{token}); made on first use, a manager may replace it. */
    statusToken: varchar("status_token", { length: ID_LENGTH }),
    createdAt: utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    updatedAt: utc("updated_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index("presses_shop_idx").on(t.shopId), uniqueIndex("presses_status_token").on(t.statusToken)],
);
