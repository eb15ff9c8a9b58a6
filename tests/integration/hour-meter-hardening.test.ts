// Hardening #4: one absurd reading can no longer jam the hour meter; a manager can correct a
// wrong reading, kept in the history with who and why, and the readings that count stay monotonic.
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { POST as correctionsRoute } from "@/app/api/presses/[pressId]/hour-meter/corrections/route";
import { POST as hourMeterRoute } from "@/app/api/presses/[pressId]/hour-meter/route";
import { db } from "@/db/client";
import { auditLog, memberships, presses, users } from "@/db/schema";
import { createSession } from "@/lib/auth/session";
import { correctHourMeter, createPress, listHourReadings, recordHourMeter } from "@/lib/data/press-edits";
import { jsonRequest, makeUser } from "./helpers";

type U = Awaited<ReturnType<typeof makeUser>>;
let manager: U;
let member: U;
const cookie = async (u: U) => ({ cookie: `session=${(await createSession(u.userId)).token}` });
const params = (pressId: string) => ({ params: Promise.resolve({ pressId }) });
const daysAgo = (d: number) => new Date(Date.now() - d * 86_400_000);

beforeAll(async () => {
  [manager, member] = await Promise.all([makeUser(), makeUser()]);
  await db.insert(memberships).values({ shopId: manager.shopId, userId: member.userId, role: "member" });
});

async function pressWithReading(hours: number, at: Date): Promise<string> {
  const { id } = await createPress({ userId: manager.userId }, manager.shopId, { name: "Meter press", frameType: "h-frame", lifecycle: "in-service" });
  await recordHourMeter({ userId: manager.userId }, id, { hours }, at);
  return id;
}

describe("the jump rule", () => {
  it("refuses 1,000,000 h from a member with a clear 409, and the true reading still goes in", async () => {
    const pressId = await pressWithReading(1200, daysAgo(2));
    const absurd = await hourMeterRoute(jsonRequest(`/api/presses/${pressId}/hour-meter`, { hours: 1_000_000 }, await cookie(member)), params(pressId));
    expect(absurd.status).toBe(409);
    expect(((await absurd.json()) as { error: string }).error).toMatch(/only 48 h have passed since then/);
    const real = await hourMeterRoute(jsonRequest(`/api/presses/${pressId}/hour-meter`, { hours: 1230 }, await cookie(member)), params(pressId));
    expect(real.status).toBe(201);
    const [row] = await db.select({ hourMeter: presses.hourMeter }).from(presses).where(eq(presses.id, pressId));
    expect(row!.hourMeter).toBe(1230);
  });
});

describe("a manager's correction", () => {
  it("voids the wrong reading, keeps it in the history with who and why, and unjams the meter", async () => {
    const pressId = await pressWithReading(100, daysAgo(30));
    // A wrong reading that the jump rule allowed (30 days could be 720 h), e.g. a typo 700 for 107.
    await recordHourMeter({ userId: member.userId }, pressId, { hours: 700 }, daysAgo(1));
    await expect(recordHourMeter({ userId: member.userId }, pressId, { hours: 110 })).rejects.toThrow(/cannot go backwards/);

    const res = await correctionsRoute(jsonRequest(`/api/presses/${pressId}/hour-meter/corrections`, { hours: 107, reason: "Typo: 700 for 107" }, await cookie(manager)), params(pressId));
    expect(res.status).toBe(201);
    // The correction states what the meter shows now; the next true reading goes in.
    await recordHourMeter({ userId: member.userId }, pressId, { hours: 107.5 });

    const entries = await listHourReadings({ userId: manager.userId }, pressId);
    expect(entries.map((e) => [e.hours, e.kind, e.voided])).toEqual([
      [107.5, "reading", false],
      [107, "correction", false],
      [700, "reading", true],
      [100, "reading", false],
    ]);
    const correction = entries.find((e) => e.kind === "correction")!;
    expect(correction.note).toBe("Typo: 700 for 107");
    const [who] = await db.select({ name: users.displayName }).from(users).where(eq(users.id, manager.userId));
    expect(correction.recordedByName).toBe(who!.name);
    // The entries that count are monotonic in time.
    const counted = entries.filter((e) => !e.voided).reverse();
    for (let i = 1; i < counted.length; i++) expect(counted[i]!.hours).toBeGreaterThanOrEqual(counted[i - 1]!.hours);
    const audit = await db.select().from(auditLog).where(eq(auditLog.action, "hour-meter.corrected"));
    expect(audit.some((a) => a.userId === manager.userId && (a.detail as { pressId?: string } | null)?.pressId === pressId)).toBe(true);
  });

  it("is for managers only (403 for a member), only lowers the meter, and needs a reason", async () => {
    const pressId = await pressWithReading(500, daysAgo(1));
    await recordHourMeter({ userId: member.userId }, pressId, { hours: 510 });
    const byMember = await correctionsRoute(jsonRequest(`/api/presses/${pressId}/hour-meter/corrections`, { hours: 505, reason: "x" }, await cookie(member)), params(pressId));
    expect(byMember.status).toBe(403);
    await expect(correctHourMeter({ userId: manager.userId }, pressId, { hours: 600, reason: "up" })).rejects.toThrow(/record a reading/);
    const noReason = await correctionsRoute(jsonRequest(`/api/presses/${pressId}/hour-meter/corrections`, { hours: 505 }, await cookie(manager)), params(pressId));
    expect(noReason.status).toBe(400);
    expect(((await noReason.json()) as { fieldErrors: Record<string, string[]> }).fieldErrors.reason).toEqual(["Say why the reading is corrected."]);
    const [row] = await db.select({ hourMeter: presses.hourMeter }).from(presses).where(eq(presses.id, pressId));
    expect(row!.hourMeter).toBe(510);
  });

  it("below every reading voids them all (each stays in the history)", async () => {
    const pressId = await pressWithReading(500, daysAgo(1));
    await correctHourMeter({ userId: manager.userId }, pressId, { hours: 50, reason: "Meter was replaced; new meter shows 50 h" });
    const entries = await listHourReadings({ userId: manager.userId }, pressId);
    expect(entries.map((e) => [e.hours, e.kind, e.voided])).toEqual([
      [50, "correction", false],
      [500, "reading", true],
    ]);
  });
});

describe("the readings list", () => {
  it("is bounded whatever the history", async () => {
    const pressId = await pressWithReading(0, daysAgo(100));
    for (let i = 1; i <= 55; i++) await recordHourMeter({ userId: manager.userId }, pressId, { hours: i }, daysAgo(100 - i));
    const entries = await listHourReadings({ userId: manager.userId }, pressId);
    expect(entries).toHaveLength(50);
    expect(entries[0]!.hours).toBe(55);
  });
});
