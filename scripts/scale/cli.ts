/**
 * `npm run seed:scale` entry point (after scripts/scale/seed-scale.sh reset and migrated the
 * database). Flags: SCALE_SEED (default 13), SCALE_FACTOR (default 1), SCALE_ANCHOR (ISO date the
 * history ends at; default today 00:00 UTC — fix it to get the same rows on another day),
 * SCALE_VERIFY=0 skips the chain check.
 */
import "dotenv/config";
import mysql from "mysql2/promise";
import { migrationDatabaseUrl } from "../../db/config";
import { inspectionChainKey } from "../../lib/inspections/chain-key";
import { seedScale, verifyAllChains } from "./seed";

async function main(): Promise<void> {
  const started = performance.now();
  const seed = Number(process.env.SCALE_SEED ?? 13);
  const factor = Number(process.env.SCALE_FACTOR ?? 1);
  const anchor = process.env.SCALE_ANCHOR ? new Date(process.env.SCALE_ANCHOR) : new Date(new Date().toISOString().slice(0, 10));
  if (!Number.isInteger(seed) || Number.isNaN(anchor.getTime())) throw new Error("SCALE_SEED must be an integer and SCALE_ANCHOR an ISO date.");
  const url = migrationDatabaseUrl();
  const connection = await mysql.createConnection({ uri: url, timezone: "Z" });
  try {
    const result = await seedScale(connection, { seed, factor, anchor, chainKey: inspectionChainKey() });
    const seeded = performance.now();
    console.log(`Scale data in ${new URL(url).pathname.slice(1)} (seed ${seed}, factor ${factor}, anchor ${anchor.toISOString().slice(0, 10)}):`);
    for (const [table, n] of Object.entries(result.counts)) console.log(`  ${table.padEnd(22)} ${n.toLocaleString("en")}`);
    console.log(`Seeded in ${((seeded - started) / 1000).toFixed(1)} s.`);
    if (process.env.SCALE_VERIFY !== "0") {
      const report = await verifyAllChains(connection);
      console.log(`Chain verifier: ${report.presses} presses, ${report.checked.toLocaleString("en")} signed inspections, ${report.broken.length === 0 ? "all intact" : `BROKEN: ${report.broken.join(", ")}`} (${((performance.now() - seeded) / 1000).toFixed(1)} s).`);
      if (report.broken.length > 0) process.exitCode = 1;
    }
    console.log(`Heavy press: ${result.heavyPressId}  → /presses/${result.heavyPressId}`);
    console.log(`Sign in: ${result.signIn.email} / ${result.signIn.password}`);
  } finally {
    await connection.end();
  }
}

await main();
