/**
 * Adds years of invented history to one named press, for measuring the press page by hand
 * (curl, autocannon). Usage:
 *   npm run seed:heavy-press -- --press "Bay 1 H-frame" [--database presswright] [--user dana@millrace-forge.example] [--scale 1]
 * `--scale 0.1` adds a tenth of the figures (db/heavy-history.ts HEAVY_COUNTS). Uses the
 * migration user (MIGRATE_DATABASE_URL, else the local default); `--database` swaps the schema
 * name in that URL. Run it again and the history doubles: it only ever adds.
 */
import "dotenv/config";
import { parseArgs } from "node:util";
import { and, eq } from "drizzle-orm";
import { drizzle } from "drizzle-orm/mysql2";
import mysql from "mysql2/promise";
import { migrationDatabaseUrl } from "../db/config";
import { addHeavyHistory, HEAVY_COUNTS, type HeavyCounts } from "../db/heavy-history";
import * as schema from "../db/schema";
import { newId } from "../lib/ids";

const { values } = parseArgs({
  options: { press: { type: "string" }, database: { type: "string" }, user: { type: "string" }, scale: { type: "string", default: "1" } },
});
if (!values.press) {
  console.error('Give the press: --press "Bay 1 H-frame" (its name; the first press of that name).');
  process.exit(2);
}
const scale = Number(values.scale);
if (!(scale > 0 && scale <= 10)) {
  console.error("--scale must be a number above 0 and at most 10.");
  process.exit(2);
}
const url = new URL(migrationDatabaseUrl());
if (values.database) url.pathname = `/${values.database}`;

const pool = mysql.createPool({ uri: url.toString(), timezone: "Z", connectionLimit: 2 });
const db = drizzle(pool, { schema, mode: "default" });
try {
  const [press] = await db.select({ id: schema.presses.id, shopId: schema.presses.shopId }).from(schema.presses).where(eq(schema.presses.name, values.press)).limit(1);
  if (!press) throw new Error(`No press named "${values.press}" in ${url.pathname.slice(1)}.`);
  const members = db
    .select({ id: schema.users.id, email: schema.users.email })
    .from(schema.memberships)
    .innerJoin(schema.users, eq(schema.users.id, schema.memberships.userId))
    .where(and(eq(schema.memberships.shopId, press.shopId), values.user ? eq(schema.users.email, values.user) : eq(schema.memberships.role, "manager")))
    .limit(1);
  const [user] = await members;
  if (!user) throw new Error(values.user ? `${values.user} is not a member of that press's shop.` : "That press's shop has no manager.");
  const counts = Object.fromEntries(Object.entries(HEAVY_COUNTS).map(([k, v]) => [k, Math.round(v * scale)])) as HeavyCounts;
  const started = Date.now();
  // A fresh tag per run keeps labels unique when the script runs twice on one press.
  await addHeavyHistory(db, press.id, user.id, counts, newId().slice(0, 4).toUpperCase());
  console.log(`Added to "${values.press}" (${press.id}) as ${user.email} in ${((Date.now() - started) / 1000).toFixed(1)} s:`, counts);
} finally {
  await pool.end();
}
