import { sql } from "drizzle-orm";
import { index, mysqlEnum, mysqlTable, varchar } from "drizzle-orm/mysql-core";
import { users } from "./auth";
import { binary, ID_LENGTH, utc } from "./columns";
import { ROLES, shops } from "./shops";

/**
 * Invitations to a shop. The e-mailed link carries `id.secret`; only SHA-256(secret) is stored.
 * Single use (`acceptedAt`), expiring, revocable; resending issues a new secret.
 */
export const invitations = mysqlTable(
  "invitations",
  {
    id: varchar("id", { length: ID_LENGTH }).primaryKey(),
    shopId: varchar("shop_id", { length: ID_LENGTH })
      .notNull()
      .references(() => shops.id, { onDelete: "cascade" }),
    email: varchar("email", { length: 254 }).notNull(),
    role: mysqlEnum("role", ROLES).notNull(),
    secretHash: binary("secret_hash", { length: 32 }).notNull(),
    invitedBy: varchar("invited_by", { length: ID_LENGTH }).references(() => users.id, { onDelete: "set null" }),
    createdAt: utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    expiresAt: utc("expires_at").notNull(),
    acceptedAt: utc("accepted_at"),
    acceptedBy: varchar("accepted_by", { length: ID_LENGTH }).references(() => users.id, { onDelete: "set null" }),
    revokedAt: utc("revoked_at"),
  },
  (t) => [index("invitations_shop_idx").on(t.shopId, t.acceptedAt, t.revokedAt)],
);

/** Password-reset links: `id.secret` in the e-mail, SHA-256(secret) here; single use, short-lived. */
export const passwordResets = mysqlTable(
  "password_resets",
  {
    id: varchar("id", { length: ID_LENGTH }).primaryKey(),
    userId: varchar("user_id", { length: ID_LENGTH })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    secretHash: binary("secret_hash", { length: 32 }).notNull(),
    createdAt: utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    expiresAt: utc("expires_at").notNull(),
    usedAt: utc("used_at"),
  },
  (t) => [index("password_resets_user_idx").on(t.userId)],
);
