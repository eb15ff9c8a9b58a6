import { sql } from "drizzle-orm";
import { boolean, char, index, int, mysqlEnum, mysqlTable, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { users } from "./auth";
import { ID_LENGTH, jsonColumn, utc } from "./columns";
import { presses } from "./presses";
import { shops } from "./shops";

export const CADENCES = ["pre-use", "weekly", "monthly", "yearly", "after-modification"] as const;
export type Cadence = (typeof CADENCES)[number];

/** Who may sign: `member` = anyone in the shop (pre-use checks); `inspector` = inspectors and managers. */
export const SIGNER_ROLES = ["member", "inspector"] as const;
export type SignerRole = (typeof SIGNER_ROLES)[number];

export const INSPECTION_AREAS = ["hydraulics", "hoses-fittings", "frame-welds", "dies-tooling", "controls-guards", "electrical"] as const;
export type InspectionArea = (typeof INSPECTION_AREAS)[number];

export const OUTCOMES = ["pass", "fail", "na"] as const;
export type Outcome = (typeof OUTCOMES)[number];

/** One checklist item as a template holds it and as an inspection snapshots it. */
export type TemplateItem = {
  /** Stable within the template, so answers and photos refer to an item, not a position. */
  key: string;
  area: InspectionArea;
  text: string;
  guidance: string;
  critical: boolean;
  photoOnFail: boolean;
  /** The press must be locked out and de-energised before this item is checked. */
  lockout: boolean;
};

/** A shop's checklist. Editing it never touches inspections already started: they keep a snapshot. */
export const inspectionTemplates = mysqlTable(
  "inspection_templates",
  {
    id: varchar("id", { length: ID_LENGTH }).primaryKey(),
    shopId: varchar("shop_id", { length: ID_LENGTH })
      .notNull()
      .references(() => shops.id, { onDelete: "cascade" }),
    name: varchar("name", { length: 100 }).notNull(),
    cadence: mysqlEnum("cadence", CADENCES).notNull(),
    signerRole: mysqlEnum("signer_role", SIGNER_ROLES).notNull(),
    items: jsonColumn<TemplateItem[]>("items").notNull(),
    archived: boolean("archived").notNull().default(false),
    createdAt: utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    updatedAt: utc("updated_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index("inspection_templates_shop_idx").on(t.shopId, t.archived)],
);

/**
 * One inspection of a press. While `signed_at` is null it is a run in progress; once signed it is
 * evidence: a trigger refuses UPDATE and DELETE, and `chain_hash` links it to the press's previous
 * signed inspection (HMAC-SHA-256, key outside the database — lib/inspections/chain.ts).
 * Press deletes are restricted (not cascaded): MariaDB does not fire triggers for cascades.
 */
export const inspections = mysqlTable(
  "inspections",
  {
    id: varchar("id", { length: ID_LENGTH }).primaryKey(),
    pressId: varchar("press_id", { length: ID_LENGTH })
      .notNull()
      .references(() => presses.id, { onDelete: "restrict" }),
    templateId: varchar("template_id", { length: ID_LENGTH }).references(() => inspectionTemplates.id, { onDelete: "set null" }),
    templateName: varchar("template_name", { length: 100 }).notNull(),
    cadence: mysqlEnum("cadence", CADENCES).notNull(),
    signerRole: mysqlEnum("signer_role", SIGNER_ROLES).notNull(),
    items: jsonColumn<TemplateItem[]>("items").notNull(),
    startedBy: varchar("started_by", { length: ID_LENGTH }).references(() => users.id, { onDelete: "set null" }),
    startedAt: utc("started_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    result: mysqlEnum("result", ["pass", "fail"]),
    signedBy: varchar("signed_by", { length: ID_LENGTH }).references(() => users.id, { onDelete: "restrict" }),
    /** The signer's name as it was at signing, part of the signed record. */
    signerName: varchar("signer_name", { length: 80 }),
    signedAt: utc("signed_at"),
    chainSeq: int("chain_seq"),
    prevHash: char("prev_hash", { length: 64 }),
    chainHash: char("chain_hash", { length: 64 }),
  },
  (t) => [
    index("inspections_press_signed_idx").on(t.pressId, t.signedAt),
    index("inspections_press_template_idx").on(t.pressId, t.templateId, t.signedAt),
    uniqueIndex("inspections_press_chain_seq").on(t.pressId, t.chainSeq),
  ],
);

/**
 * One row per snapshot item, created with the inspection (outcome null until answered), so a photo
 * of a failed item can point at it (`photos.inspection_item_id`). Read-only once the inspection is
 * signed (trigger).
 */
export const inspectionAnswers = mysqlTable(
  "inspection_answers",
  {
    id: varchar("id", { length: ID_LENGTH }).primaryKey(),
    inspectionId: varchar("inspection_id", { length: ID_LENGTH })
      .notNull()
      .references(() => inspections.id, { onDelete: "restrict" }),
    itemKey: varchar("item_key", { length: 40 }).notNull(),
    position: int("position").notNull(),
    outcome: mysqlEnum("outcome", OUTCOMES),
    note: varchar("note", { length: 1000 }),
    answeredBy: varchar("answered_by", { length: ID_LENGTH }).references(() => users.id, { onDelete: "set null" }),
    answeredAt: utc("answered_at"),
  },
  (t) => [uniqueIndex("inspection_answers_item").on(t.inspectionId, t.itemKey)],
);

/**
 * Idempotency keys of answer changes sent by a phone (possibly after a long time offline): a change
 * whose key is already here was applied before and is skipped, so a retried send lands once.
 */
export const inspectionAnswerOps = mysqlTable(
  "inspection_answer_ops",
  {
    opKey: varchar("op_key", { length: 64 }).primaryKey(),
    inspectionId: varchar("inspection_id", { length: ID_LENGTH })
      .notNull()
      .references(() => inspections.id, { onDelete: "cascade" }),
    itemKey: varchar("item_key", { length: 40 }).notNull(),
    appliedAt: utc("applied_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index("inspection_answer_ops_inspection_idx").on(t.inspectionId)],
);
