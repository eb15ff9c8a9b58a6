/**
 * Seeds the demo scenario (db/demo-data.ts) into an empty database; does nothing when any user
 * exists, so the start command can run it every time. Prints the demo sign-ins.
 */
import "dotenv/config";
import { hash } from "@node-rs/argon2";
import { count } from "drizzle-orm";
import { drizzle } from "drizzle-orm/mysql2";
import mysql from "mysql2/promise";
import { ARGON2_PARAMS } from "../lib/auth/password-rules";
import { newId } from "../lib/ids";
import { migrationDatabaseUrl } from "./config";
import { seedDemoInspections } from "./demo-inspections";
import { DEMO_PARTS, DEMO_READINGS } from "./demo-parts";
import { BUILDER_PRESSES, DEMO_PASSWORD, DEMO_USERS, ratedForceKn, WORKSHOP, WORKSHOP_PRESSES, type DemoPress } from "./demo-data";
import * as schema from "./schema";

function pressRow(shopId: string, p: DemoPress): typeof schema.presses.$inferInsert {
  const { boreMm: bore, ...rest } = p;
  return { id: newId(), shopId, ...rest, ratedForceKn: Math.round(ratedForceKn(bore, p.reliefPressureBar) * 10) / 10 };
}

type Tx = Parameters<Parameters<ReturnType<typeof drizzle<typeof schema>>["transaction"]>[0]>[0];

/** A demo press with its parts and hour-meter log. */
async function insertPress(tx: Tx, shopId: string, p: DemoPress): Promise<void> {
  const row = pressRow(shopId, p);
  await tx.insert(schema.presses).values(row);
  const parts = DEMO_PARTS[p.name] ?? [];
  if (parts.length > 0) {
    await tx.insert(schema.components).values(
      parts.map((part) => ({ id: newId(), pressId: row.id!, ...part, kind: part.spec.kind, purchased: part.purchased ?? true })),
    );
  }
  const readings = DEMO_READINGS[p.name] ?? [];
  if (readings.length > 0) {
    await tx.insert(schema.hourMeterReadings).values(
      readings.map(([hours, daysAgo]) => ({ pressId: row.id!, hours, readAt: new Date(Date.now() - daysAgo * 86_400_000) })),
    );
  }
}

export async function seedDemo(url = migrationDatabaseUrl()): Promise<boolean> {
  const connection = await mysql.createConnection({ uri: url, timezone: "Z" });
  try {
    const db = drizzle(connection, { schema, mode: "default" });
    const [existing] = await db.select({ n: count() }).from(schema.users);
    if ((existing?.n ?? 0) > 0) return false;

    const passwordHash = await hash(DEMO_PASSWORD, ARGON2_PARAMS);
    const ids = Object.fromEntries(DEMO_USERS.map((u) => [u.key, newId()]));
    const workshopId = newId();
    await db.transaction(async (tx) => {
      await tx.insert(schema.shops).values({ id: workshopId, name: WORKSHOP.name, timeZone: WORKSHOP.timeZone, currency: WORKSHOP.currency });
      for (const u of DEMO_USERS) {
        const personalId = newId();
        const activeShopId = u.key === "builder" ? personalId : workshopId;
        await tx.insert(schema.users).values({ id: ids[u.key]!, email: u.email, displayName: u.displayName, unitSystem: u.unitSystem, passwordHash, activeShopId });
        await tx.insert(schema.shops).values({ id: personalId, name: `${u.displayName}'s shop`, personal: true });
        await tx.insert(schema.memberships).values({ shopId: personalId, userId: ids[u.key]!, role: "manager" });
        if (u.key === "builder") for (const p of BUILDER_PRESSES) await insertPress(tx, personalId, p);
      }
      for (const [key, role] of Object.entries(WORKSHOP.roles)) {
        await tx.insert(schema.memberships).values({ shopId: workshopId, userId: ids[key]!, role });
      }
      for (const p of WORKSHOP_PRESSES) await insertPress(tx, workshopId, p);
      await seedDemoInspections(tx, workshopId, ids, Object.fromEntries(DEMO_USERS.map((u) => [u.key, u.displayName])));
    });
    return true;
  } finally {
    await connection.end();
  }
}

export function printDemoSignIns(): void {
  const roleOf = (key: string): string =>
    key === "builder" ? "home builder (own shop)" : `${WORKSHOP.roles[key as keyof typeof WORKSHOP.roles]} at ${WORKSHOP.name}`;
  console.log("\nDemo sign-ins (password for all: " + DEMO_PASSWORD + ")");
  for (const u of DEMO_USERS) console.log(`  ${u.email.padEnd(32)} ${roleOf(u.key)}`);
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const args = process.argv.slice(2);
  if (args.includes("--print-only")) {
    printDemoSignIns();
    process.exit(0);
  }
  seedDemo()
    .then((seeded) => {
      console.log(seeded ? "Demo data seeded." : "Database already has users; demo seed skipped.");
      if (!args.includes("--quiet")) printDemoSignIns();
    })
    .catch((error: unknown) => {
      console.error("Seeding failed:", (error as Error).message);
      process.exit(1);
    });
}
