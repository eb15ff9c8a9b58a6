import { asc, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { GET as listPhotosRoute } from "@/app/api/presses/[pressId]/photos/route";
import { db } from "@/db/client";
import { addHeavyHistory, type HeavyCounts } from "@/db/heavy-history";
import { components, hourMeterReadings, presses } from "@/db/schema";
import { NotFoundError } from "@/lib/auth/permissions";
import { CHAIN_RECHECK_MS, pressChainStatus } from "@/lib/data/chain-status";
import { countPressPhotos, listPressPhotos, PHOTO_PAGE } from "@/lib/data/photos";
import { HISTORY_SHOWN, listRecentHistory } from "@/lib/data/press-history";
import { newId } from "@/lib/ids";
import { pressTimeline } from "@/lib/press/timeline";
import { getRequest } from "./helpers";
import { cookie, makeSharedShop, params, type TestUser } from "./shop-context";

// The press page's windows over a press with more history than any of them shows.
const COUNTS: HeavyCounts = { installedParts: 5, replacedParts: 40, readings: 120, serviceEntries: 0, inspections: 6, photos: 30, problems: 0, tagOuts: 0 };

let pressId: string;
let manager: TestUser;
let outsider: TestUser;

beforeAll(async () => {
  const shop = await makeSharedShop();
  ({ pressId, manager, outsider } = shop);
  await addHeavyHistory(db, pressId, manager.userId, COUNTS, "W");
});

describe("recent history", () => {
  it("is exactly the newest events of the whole history, however many there are", async () => {
    const actor = { userId: manager.userId };
    const [press] = await db.select({ createdAt: presses.createdAt }).from(presses).where(eq(presses.id, pressId));
    const allParts = await db.select().from(components).where(eq(components.pressId, pressId));
    const allReadings = await db.select().from(hourMeterReadings).where(eq(hourMeterReadings.pressId, pressId)).orderBy(asc(hourMeterReadings.id));
    const whole = pressTimeline(press!.createdAt, allParts, allReadings.map((r) => ({ ...r, voided: r.voidedBy !== null })));
    expect(whole.length).toBeGreaterThan(HISTORY_SHOWN * 5);

    const recent = await listRecentHistory(actor, pressId, press!.createdAt);
    expect(recent).toHaveLength(HISTORY_SHOWN);
    // The same days; the same events on every day but the oldest, where the window may cut
    // between events of one day in another order.
    const newest = whole.slice(0, HISTORY_SHOWN);
    expect(recent.map((e) => e.on)).toEqual(newest.map((e) => e.on));
    const cut = newest.at(-1)!.on;
    const above = (events: typeof whole) => new Set(events.filter((e) => e.on > cut).map((e) => e.title));
    expect(above(recent)).toEqual(above(newest));
  });

  it("names the successor of a replaced part even when the successor's own events are older than the window", async () => {
    const [press] = await db.select({ createdAt: presses.createdAt }).from(presses).where(eq(presses.id, pressId));
    const many = await listRecentHistory({ userId: manager.userId }, pressId, press!.createdAt, 200);
    expect(many.filter((e) => e.kind === "replaced").every((e) => /^Return filter W-\d{4} replaced by Return filter W-\d{4}$/.test(e.title))).toBe(true);
  });

  it("is refused to anyone outside the shop", async () => {
    await expect(listRecentHistory({ userId: outsider.userId }, pressId, new Date())).rejects.toBeInstanceOf(NotFoundError);
  });
});

describe("press photos in pages", () => {
  it("pages through every photo once, newest first, with counts of each kind", async () => {
    const actor = { userId: manager.userId };
    const first = await listPressPhotos(actor, pressId);
    expect(first.photos).toHaveLength(PHOTO_PAGE);
    expect(first.nextCursor).not.toBeNull();
    const second = await listPressPhotos(actor, pressId, { cursor: first.nextCursor! });
    expect(second.photos).toHaveLength(COUNTS.photos - PHOTO_PAGE);
    expect(second.nextCursor).toBeNull();
    const all = [...first.photos, ...second.photos];
    expect(new Set(all.map((p) => p.id)).size).toBe(COUNTS.photos);
    const times = all.map((p) => p.createdAt.getTime());
    expect(times).toEqual([...times].sort((a, b) => b - a));
    expect(await countPressPhotos(actor, pressId)).toEqual({ other: COUNTS.photos });
  });

  it("answers the API with a page, a cursor and the counts, and a clear 400 for a cursor it did not make", async () => {
    const auth = await cookie(manager);
    const res = await listPhotosRoute(getRequest(`/api/presses/${pressId}/photos?limit=5`, auth), params("pressId", pressId));
    expect(res.status).toBe(200);
    const body = (await res.json()) as { photos: unknown[]; nextCursor: string | null; counts: Record<string, number> };
    expect(body.photos).toHaveLength(5);
    expect(body.nextCursor).toMatch(/^\d{13}_[a-z2-7]{24}$/);
    expect(body.counts).toEqual({ other: COUNTS.photos });

    const bad = await listPhotosRoute(getRequest(`/api/presses/${pressId}/photos?cursor=1'%20OR%201=1`, auth), params("pressId", pressId));
    expect(bad.status).toBe(400);
    expect(JSON.stringify(await bad.json())).toContain("Not a cursor from this list.");
  });
});

describe("chain check on the press page", () => {
  it("checks the whole chain once, keeps the result while the newest link stands, and checks again after a new signature or when it is old", async () => {
    const actor = { userId: manager.userId };
    const t0 = new Date();
    const first = await pressChainStatus(actor, pressId, t0);
    expect(first).toMatchObject({ intact: true, checked: COUNTS.inspections, brokenCount: 0 });
    // Same newest link, within the window: the kept result (no full recomputation).
    const again = await pressChainStatus(actor, pressId, new Date(t0.getTime() + 1000));
    expect(again).toBe(first);

    await addHeavyHistory(db, pressId, manager.userId, { ...COUNTS, installedParts: 0, replacedParts: 0, readings: 0, photos: 0, inspections: 1 }, newId().slice(0, 4));
    const afterSigning = await pressChainStatus(actor, pressId, new Date(t0.getTime() + 2000));
    expect(afterSigning).toMatchObject({ intact: true, checked: COUNTS.inspections + 1 });

    const later = await pressChainStatus(actor, pressId, new Date(t0.getTime() + 2000 + CHAIN_RECHECK_MS));
    expect(later).not.toBe(afterSigning);
    expect(later.checked).toBe(COUNTS.inspections + 1);
  });

  it("is refused to anyone outside the shop, even when a result is kept", async () => {
    await expect(pressChainStatus({ userId: outsider.userId }, pressId)).rejects.toBeInstanceOf(NotFoundError);
  });
});
