/**
 * Seeds the scale data set into an empty, migrated database and checks every signed chain with
 * the app's own verifier. Used by `npm run seed:scale` (scripts/scale/seed-scale.sh) and by the
 * integration test at a small SCALE_FACTOR.
 */
import { hash } from "@node-rs/argon2";
import { eq } from "drizzle-orm";
import { drizzle } from "drizzle-orm/mysql2";
import type mysql from "mysql2/promise";
import * as schema from "../../db/schema";
import { verifyChainIn } from "../../lib/data/inspection-sign";
import { ARGON2_PARAMS } from "../../lib/auth/password-rules";
import { generateShop, SCALE_PASSWORD, scaleConfig, scaleEmail, TABLE_ORDER, type ShopContext, type TableName } from "./generate";
import { insertShops, prepareSession } from "./insert";

const SHOPS_PER_TRANSACTION = 5;

export type ScaleOptions = { seed: number; factor: number; anchor: Date; chainKey: string };
export type ScaleResult = { counts: Record<TableName, number>; heavyPressId: string; signIn: { email: string; password: string } };

export async function seedScale(connection: mysql.Connection, options: ScaleOptions): Promise<ScaleResult> {
  const config = scaleConfig(options.factor);
  // One argon2 hash for every account: hashing 250 passwords would take longer than the rest.
  const ctx: ShopContext = { seed: options.seed, config, anchor: options.anchor, chainKey: options.chainKey, passwordHash: await hash(SCALE_PASSWORD, ARGON2_PARAMS) };
  await prepareSession(connection);
  let heavyPressId = "";
  for (let first = 0; first < config.shops; first += SHOPS_PER_TRANSACTION) {
    const batch = [];
    for (let i = first; i < Math.min(config.shops, first + SHOPS_PER_TRANSACTION); i++) batch.push(generateShop(ctx, i));
    if (first === 0) heavyPressId = String(batch[0]!.presses[0]!.id);
    await insertShops(connection, batch);
  }
  const counts = {} as Record<TableName, number>;
  for (const table of TABLE_ORDER) {
    const [rows] = await connection.query<mysql.RowDataPacket[]>(`SELECT COUNT(*) AS n FROM \`${table}\``);
    counts[table] = Number(rows[0]!.n);
  }
  return { counts, heavyPressId, signIn: { email: scaleEmail(0, "manager"), password: SCALE_PASSWORD } };
}

/** Runs the app's chain verifier over every press; returns the presses whose chain is not intact. */
export async function verifyAllChains(connection: mysql.Connection): Promise<{ presses: number; checked: number; broken: string[] }> {
  const db = drizzle(connection, { schema, mode: "default" });
  const presses = await db.select({ id: schema.presses.id }).from(schema.presses).where(eq(schema.presses.lifecycle, "in-service"));
  const broken: string[] = [];
  let checked = 0;
  for (const { id } of presses) {
    const report = await verifyChainIn(db, id);
    checked += report.checked;
    if (!report.intact) broken.push(id);
  }
  return { presses: presses.length, checked, broken };
}
