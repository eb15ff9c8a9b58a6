/**
 * Backup and restore drill on a scratch MariaDB server (tests/scratch-mariadb.ts), never the shared
 * test server: the demo data (presses with signed inspections on a valid chain) is backed up with
 * `npm run db:backup`, restored with `npm run db:restore` into another database, and the copy must
 * match CHECKSUM TABLE for every table, keep its read-only triggers, and pass the inspection-chain
 * verifier for every press — which must also catch a record tampered with in the copy.
 */
import { rmSync } from "node:fs";
import { drizzle } from "drizzle-orm/mysql2";
import mysql from "mysql2/promise";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as schema from "@/db/schema";
import { verifyChainIn } from "@/lib/data/inspection-sign";
import { scratchMariaDb } from "../scratch-mariadb";

const SOURCE = "presswright";
// Provisioned by scripts/db.sh with the app user's rows-only grants, so the verifier reads it as the app does.
const TARGET = "presswright_test";
const scratch = scratchMariaDb("drill", 0);
let pool: mysql.Pool | undefined;
let dump = "";

const rows = async (database: string, statement: string): Promise<string[][]> =>
  (await scratch.sql(database, statement))
    .split("\n")
    .filter(Boolean)
    .map((line) => line.split("\t"));

async function checksums(database: string): Promise<Map<string, string>> {
  const tables = (await rows(database, `SELECT table_name FROM information_schema.tables WHERE table_schema = '${database}' AND table_type = 'BASE TABLE' ORDER BY table_name`)).map(([t]) => t ?? "");
  const out = new Map<string, string>();
  for (const [name, sum] of await rows(database, tables.map((t) => `CHECKSUM TABLE \`${t}\`;`).join(" "))) out.set((name ?? "").split(".")[1] ?? "", sum ?? "");
  return out;
}

async function refusal(promise: Promise<unknown>): Promise<string> {
  try {
    await promise;
  } catch (error) {
    return String((error as { stderr?: string }).stderr ?? error);
  }
  throw new Error("expected a refusal");
}

beforeAll(async () => {
  await scratch.start();
  await scratch.migrate(SOURCE);
  await scratch.seed(SOURCE);
  await scratch.sql("mysql", `DROP DATABASE IF EXISTS \`${TARGET}\`; CREATE DATABASE \`${TARGET}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;`);
  pool = mysql.createPool({ uri: scratch.appUrl(TARGET), timezone: "Z", connectionLimit: 2 });
}, 180_000);

afterAll(async () => {
  await pool?.end();
  if (dump) rmSync(dump, { force: true });
  await scratch.stop();
});

describe("backup and restore drill", () => {
  it("backs up, restores into another database, and the copy matches table for table with an intact chain", { timeout: 120_000 }, async () => {
    const backup = await scratch.script("db-backup.sh", [SOURCE]);
    dump = /backup written: (\S+\.sql\.gz)/.exec(backup)?.[1] ?? "";
    expect(dump, backup).not.toBe("");

    // The newest dump of SOURCE, found by name, into the empty TARGET.
    expect(await scratch.script("db-restore.sh", ["--from", SOURCE, TARGET])).toContain(`restored`);
    // A second restore would overwrite data: refused without --force, and nothing is dropped.
    expect(await refusal(scratch.script("db-restore.sh", [TARGET, dump]))).toMatch(/is not empty .*--force/);
    expect(await scratch.script("db-restore.sh", ["--force", TARGET, dump])).toContain("dropping");

    const source = await checksums(SOURCE);
    const restored = await checksums(TARGET);
    const matched = [...source].filter(([t, sum]) => restored.get(t) === sum).length;
    const pct = (100 * matched) / source.size;
    console.log(`[restore drill] ${matched}/${source.size} tables match CHECKSUM TABLE (${pct.toFixed(1)} %)`);
    expect(source.size).toBeGreaterThan(20);
    expect([...restored.keys()]).toEqual([...source.keys()]);
    expect(pct).toBe(100);

    // The project's own drill script agrees.
    expect(await scratch.script("db-restore-drill.sh", [SOURCE, dump])).toMatch(/\(100\.0%\)[\s\S]*restore drill passed/);

    // Triggers came back: a signed inspection is still read-only for the app user in the copy.
    const copy = drizzle(pool!, { schema, mode: "default" });
    const [[signed]] = (await pool!.query("SELECT id FROM inspections WHERE chain_seq IS NOT NULL LIMIT 1")) as unknown as [{ id: string }[]];
    expect(signed).toBeDefined();
    await expect(pool!.query("UPDATE inspections SET signer_name = 'Someone else' WHERE id = ?", [signed!.id])).rejects.toThrow(/signed/i);

    const presses = (await pool!.query("SELECT id FROM presses ORDER BY id"))[0] as { id: string }[];
    let checked = 0;
    for (const { id } of presses) {
      const report = await verifyChainIn(copy, id);
      expect(report, `press ${id}`).toMatchObject({ intact: true, brokenCount: 0 });
      checked += report.checked;
    }
    console.log(`[restore drill] chain verifier on the copy: ${presses.length} presses, ${checked} signed inspections, all intact`);
    expect(checked).toBeGreaterThan(0);
  });

  it("the verifier on the restored copy catches a record altered behind the triggers' back", { timeout: 60_000 }, async () => {
    const copy = drizzle(pool!, { schema, mode: "default" });
    const [[victim]] = (await pool!.query("SELECT id, press_id AS pressId FROM inspections WHERE chain_seq IS NOT NULL ORDER BY chain_seq DESC LIMIT 1")) as unknown as [{ id: string; pressId: string }[]];
    expect(victim).toBeDefined();
    // Someone with admin rights on the copy drops the guard and rewrites who signed.
    await scratch.sql(TARGET, `DROP TRIGGER inspections_signed_no_update; UPDATE inspections SET signer_name = 'Someone else' WHERE id = '${victim!.id}';`);
    const report = await verifyChainIn(copy, victim!.pressId);
    expect(report.intact).toBe(false);
    expect(report.broken).toContainEqual(expect.objectContaining({ id: victim!.id, reason: "content" }));
  });
});
