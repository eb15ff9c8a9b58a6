// npm run seed:scale at SCALE_FACTOR 0.01, into its own database (presswright_scale_test, granted
// by scripts/db.sh like the others), so the shared test database keeps its state: the seeded
// chains must verify intact with the app's own verifier.
import { drizzle } from "drizzle-orm/mysql2";
import { migrate } from "drizzle-orm/mysql2/migrator";
import mysql from "mysql2/promise";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { inspectionChainKey } from "@/lib/inspections/chain-key";
import { scaleConfig } from "@/scripts/scale/generate";
import { seedScale, verifyAllChains } from "@/scripts/scale/seed";

const SCALE_TEST_DB = "presswright_scale_test";
const base = new URL(process.env.MIGRATE_DATABASE_URL ?? "");
let connection: mysql.Connection;

beforeAll(async () => {
  const admin = await mysql.createConnection({ uri: Object.assign(new URL(base), { pathname: "/" }).toString() });
  await admin.query(`DROP DATABASE IF EXISTS \`${SCALE_TEST_DB}\``);
  await admin.query(`CREATE DATABASE \`${SCALE_TEST_DB}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  await admin.end();
  connection = await mysql.createConnection({ uri: Object.assign(new URL(base), { pathname: `/${SCALE_TEST_DB}` }).toString(), multipleStatements: true, timezone: "Z" });
  await migrate(drizzle(connection), { migrationsFolder: "db/migrations" });
}, 120_000);

afterAll(async () => {
  await connection?.query(`DROP DATABASE IF EXISTS \`${SCALE_TEST_DB}\``);
  await connection?.end();
});

describe("scale seed (SCALE_FACTOR 0.01)", () => {
  it("seeds the scaled counts and every signed chain verifies intact", async () => {
    const config = scaleConfig(0.01);
    const result = await seedScale(connection, { seed: 13, factor: 0.01, anchor: new Date("2026-06-01T00:00:00Z"), chainKey: inspectionChainKey() });
    expect(result.counts).toMatchObject({ shops: config.shops, presses: config.presses, service_entries: config.serviceEntries, inspections: config.inspections, bookings: config.bookings });
    const report = await verifyAllChains(connection);
    expect(report).toEqual({ presses: config.presses, checked: config.inspections, broken: [] });
    const [signed] = await connection.query<mysql.RowDataPacket[]>("SELECT COUNT(*) AS n FROM inspections WHERE signed_at IS NOT NULL AND chain_hash IS NOT NULL");
    expect(Number(signed[0]!.n)).toBe(config.inspections);
  }, 120_000);
});
