import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { addHeavyHistory, type HeavyCounts } from "@/db/heavy-history";
import { memberships, presses, shops, users } from "@/db/schema";
import { createSession } from "@/lib/auth/session";
import { newId } from "@/lib/ids";
import { BASE_URL } from "./browser";

// Two presses of a shop of their own (so the shared demo data stays as it was): the same parts,
// one with a little more history than every list on the press page shows, one with ten times
// that. The page must come out the same size with the same rows: every list is a window.
// Signed inspections are left out here because they can never be deleted; the chain check's
// bounded cost is covered by tests/integration/press-page-data.test.ts.
const SMALL: HeavyCounts = { installedParts: 12, replacedParts: 30, readings: 30, serviceEntries: 30, inspections: 0, photos: 30, problems: 30, tagOuts: 30 };
const LARGE: HeavyCounts = { installedParts: 12, replacedParts: 300, readings: 600, serviceEntries: 600, inspections: 0, photos: 300, problems: 300, tagOuts: 300 };

const shopId = newId();
const userId = newId();
let cookie = "";
const pressIds = { small: newId(), large: newId() };

async function pressHtml(pressId: string): Promise<string> {
  const res = await fetch(`${BASE_URL}/presses/${pressId}`, { headers: { cookie } });
  expect(res.status).toBe(200);
  return res.text();
}

const occurrences = (html: string, text: string): number => html.split(text).length - 1;
/** Events in the rendered History card. */
const timelineEvents = (html: string): number => occurrences(/data-testid="press-timeline">(.*?)<\/ol>/s.exec(html)?.[1] ?? "", "<li");

beforeAll(async () => {
  await db.insert(shops).values({ id: shopId, name: "Size-check shop", personal: true });
  await db.insert(users).values({ id: userId, email: `size-check-${userId}@example.test`, displayName: "Size Check", passwordHash: "not-a-password", activeShopId: shopId });
  await db.insert(memberships).values({ shopId, userId, role: "manager" });
  for (const [which, counts] of [["small", SMALL], ["large", LARGE]] as const) {
    await db.insert(presses).values({ id: pressIds[which], shopId, name: `Size check ${which}`, frameType: "h-frame", lifecycle: "in-service", hourMeter: 10 });
    await addHeavyHistory(db, pressIds[which], userId, counts, which === "small" ? "S" : "L");
  }
  const { token } = await createSession(userId);
  cookie = `session=${token}`;
});

afterAll(async () => {
  // The shop's presses and their history, the membership and the session go with the shop and the user.
  await db.delete(shops).where(eq(shops.id, shopId));
  await db.delete(users).where(eq(users.id, userId));
  await pool.end();
});

describe("press page with years of history", () => {
  it("is the same size, with the same number of rows, whether the history is small or ten times larger", async () => {
    const small = await pressHtml(pressIds.small);
    const large = await pressHtml(pressIds.large);
    // Only figures differ (counts, dates, hours): well within a few per cent.
    expect(Math.abs(large.length - small.length) / small.length).toBeLessThan(0.05);
    for (const kind of ["Service note", "Photo", "Problem", "Tag-out"]) {
      const shownSmall = occurrences(small, `${kind} S-`);
      expect(shownSmall, kind).toBeGreaterThan(0);
      expect(occurrences(large, `${kind} L-`), kind).toBe(shownSmall);
    }
    expect(timelineEvents(large)).toBe(timelineEvents(small));
    // The gallery says how many photos there are, and shows a page of them.
    expect(large).toContain("Show older photos");
  });

  it("sends an installed part a bounded number of times: rendered once, passed to the client once", async () => {
    const html = await pressHtml(pressIds.large);
    // The table cell, its edit/replace/remove links, the table's data, the timeline's
    // "installed" line and the photo uploader's list of parts — never once per list it is in twice over.
    for (const times of [occurrences(html, "Die L-0012"), occurrences(await pressHtml(pressIds.small), "Die S-0012")]) {
      expect(times).toBeGreaterThan(0);
      expect(times).toBeLessThanOrEqual(9);
    }
  });
});
