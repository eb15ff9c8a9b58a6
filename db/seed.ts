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
import { addLocalDays, localDate } from "../lib/schedule";
import { seedDemoInspections } from "./demo-inspections";
import { DEMO_PARTS, DEMO_READINGS } from "./demo-parts";
import { DEMO_SERVICE } from "./demo-service";
import { fromWallTime, startOfLocalDay, toWallTime } from "../lib/time-zone";
import { BUILDER_PRESSES, DEMO_BOOKINGS, DEMO_PASSWORD, DEMO_USERS, ratedForceKn, WORKSHOP, WORKSHOP_PRESSES, type DemoPress } from "./demo-data";
import { bookings } from "./schema/bookings";
import * as schema from "./schema";

function pressRow(shopId: string, p: DemoPress): typeof schema.presses.$inferInsert {
  const { boreMm: bore, cylinders, ...rest } = p;
  return { id: newId(), shopId, ...rest, ratedForceKn: Math.round(ratedForceKn(bore, p.reliefPressureBar, cylinders) * 10) / 10 };
}

type Tx = Parameters<Parameters<ReturnType<typeof drizzle<typeof schema>>["transaction"]>[0]>[0];

/** A demo press's service log and plan (db/demo-service.ts), dated back from today in the shop's zone. */
async function insertService(tx: Tx, pressId: string, p: DemoPress, people: { manager: string; inspector: string }, timeZone: string): Promise<void> {
  const demo = DEMO_SERVICE[p.name];
  if (!demo) return;
  const today = localDate(new Date(), timeZone);
  for (const e of demo.entries) {
    const { daysAgo, by, ...fields } = e;
    await tx.insert(schema.serviceEntries).values({ id: newId(), pressId, ...fields, parts: e.parts ?? [], performedOn: addLocalDays(today, -daysAgo), performedBy: people[by] });
  }
  for (const t of demo.tasks) {
    const { lastDaysAgo, lastHours, ...fields } = t;
    await tx.insert(schema.serviceTasks).values({ id: newId(), pressId, ...fields, lastDoneOn: addLocalDays(today, -lastDaysAgo), lastDoneHours: lastHours });
  }
}

/** A demo press with its parts and hour-meter log. */
async function insertPress(tx: Tx, shopId: string, p: DemoPress, service?: { people: { manager: string; inspector: string }; timeZone: string }): Promise<string> {
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
  if (service) await insertService(tx, row.id!, p, service.people, service.timeZone);
  return row.id!;
}

/** The demo bookings, on whole hours in the workshop's zone from the day the seed runs. */
function demoBookings(pressIds: Map<string, string>, userIds: Record<string, string>): (typeof bookings.$inferInsert)[] {
  return DEMO_BOOKINGS.map(([press, who, days, hour, length]) => {
    const day = startOfLocalDay(new Date(), WORKSHOP.timeZone, days);
    const w = toWallTime(day, WORKSHOP.timeZone);
    const startsAt = fromWallTime({ year: w.year, month: w.month, day: w.day, hour, minute: 0 }, WORKSHOP.timeZone);
    return { id: newId(), pressId: pressIds.get(press)!, userId: userIds[who]!, startsAt, endsAt: new Date(startsAt.getTime() + length * 3_600_000) };
  });
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
      const people = { manager: ids.manager!, inspector: ids.inspector! };
      const pressIds = new Map<string, string>();
      for (const p of WORKSHOP_PRESSES) pressIds.set(p.name, await insertPress(tx, workshopId, p, { people, timeZone: WORKSHOP.timeZone }));
      await tx.insert(bookings).values(demoBookings(pressIds, ids));
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
