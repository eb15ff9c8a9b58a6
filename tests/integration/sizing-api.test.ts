import { randomUUID } from "node:crypto";
import { NextRequest } from "next/server";
import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { POST } from "@/app/api/sizing/route";
import { db } from "@/db/client";
import { rateLimitWindows } from "@/db/schema";
import { CLIENT_IP_HEADER } from "@/lib/auth/client-ip";
import { hitRateLimit, SIZING_API_LIMIT } from "@/lib/rate-limit";
import { FULL_SIZING_INPUT } from "../fixtures/sizing-inputs";

/** Each test its own invented address, so rate-limit counts never mix. */
const fakeIp = (): string => `test-${randomUUID()}`;

/** A request as curl from another site would send it: no Origin of ours, no cookie. */
function sizingRequest(body: string | object, ip = fakeIp(), query = ""): NextRequest {
  return new NextRequest(`http://127.0.0.1:3000/api/sizing${query}`, {
    method: "POST",
    body: typeof body === "string" ? body : JSON.stringify(body),
    headers: { "content-type": "application/json", [CLIENT_IP_HEADER]: ip },
  });
}

const call = (req: NextRequest): Promise<Response> => POST(req, undefined);

const GOOD = {
  cylinders: { count: 1, boreMm: 101.6, rodMm: 50.8, strokeMm: 300 },
  pump: { kind: "two-stage", approachFlowLpm: 40, pressingFlowLpm: 9, unloadBar: 40 },
  pressureBar: 172.368932, // 2500 psi (computed from formula)
  reliefBar: 180,
  motorKw: 5.5,
  pressDistanceMm: 50,
  ratings: { hoseBar: 150 },
};

type Body = Record<string, unknown> & { fieldErrors?: Record<string, string[]>; error?: string };

describe("POST /api/sizing — good request", () => {
  it("returns the documented fields, SI units in their names, with sourced checks", async () => {
    const res = await call(sizingRequest(GOOD));
    expect(res.status).toBe(200);
    expect(res.headers.get("ratelimit-limit")).toBe(String(SIZING_API_LIMIT.limit));
    const body = (await res.json()) as Body;
    for (const key of [
      "forceKn", "forceTonnesForce", "forceShortTons", "reliefForceKn", "retractForceKn",
      "advanceSpeedMmS", "pressingSpeedMmS", "retractSpeedMmS", "cycleTimeS",
      "approachPowerKw", "pressingPowerKw", "motorRequiredKw", "maxPressureForMotorBar",
    ]) {
      expect(typeof body[key], key).toBe("number");
    }
    // 4 in bore at 2500 psi → 139.75 kN, 15.708 short tons (reference §1, computed from formula)
    expect(body.forceKn as number).toBeCloseTo(139.75, 2);
    expect(body.forceShortTons as number).toBeCloseTo(15.708, 3);
    const checks = body.checks as { id: string; level: string; rule: string; source: string }[];
    const hose = checks.find((c) => c.id === "rating-hose");
    expect(hose?.level).toBe("fail"); // rated 150 bar below the 180 bar relief
    for (const c of checks) expect(c.source.length).toBeGreaterThan(0);
    expect(body.overall).toBe("fail");
  });

  it("words check messages in imperial units on request, numbers stay SI", async () => {
    const body = (await (await call(sizingRequest(GOOD, fakeIp(), "?units=imperial"))).json()) as Body;
    const checks = body.checks as { id: string; message: string }[];
    expect(checks.find((c) => c.id === "relief-vs-working")?.message).toContain("psi");
    expect(body.forceKn as number).toBeCloseTo(139.75, 2);
  });
});

describe("POST /api/sizing — incomplete, missing and the second-edition blocks", () => {
  it("a design without frame, ratings or buckling is incomplete and lists what is missing; an omitted relief is an assumption", async () => {
    const { reliefBar: _relief, ratings: _ratings, ...bare } = GOOD;
    const body = (await (await call(sizingRequest(bare))).json()) as Body & { missing: { id: string; label: string }[]; assumptions: string[] };
    expect(body.overall).toBe("incomplete");
    expect(body.missing.map((m) => m.id)).toEqual([
      "rating-hose", "rating-valve", "rating-pump", "rating-cylinder", "plate-crosshead", "plate-bolster", "columns", "rod-buckling",
    ]);
    for (const m of body.missing) expect(m.label.length).toBeGreaterThan(3);
    expect(body.assumptions).toHaveLength(1);
  });

  it("every block filled: nothing missing; the platen, throat and die results come back", async () => {
    const body = (await (await call(sizingRequest(FULL_SIZING_INPUT))).json()) as Body & { missing: unknown[] };
    expect(body.missing).toEqual([]);
    expect(["ok", "warn"]).toContain(body.overall);
    expect(body.platen).toMatchObject({ safetyFactor: expect.any(Number), deflectionMm: expect.any(Number) });
    expect(body.throat).toMatchObject({ openingDeg: expect.any(Number) });
    expect(body.dies).toEqual([expect.objectContaining({ name: "Drawing dies", maxGaugeBar: expect.any(Number) })]);
    expect((body.plates as unknown[]).length).toBe(2);
  });

  it("a two-ram design with a thin platen fails and names the platen", async () => {
    const thin = { ...FULL_SIZING_INPUT, platen: { rodSpacingMm: 400, dieWidthMm: 80, widthMm: 200, thicknessMm: 20, grade: "S235JR" } };
    const body = (await (await call(sizingRequest(thin))).json()) as Body;
    expect(body.overall).toBe("fail");
    const platen = (body.checks as { id: string; level: string; message: string }[]).find((c) => c.id === "platen");
    expect(platen?.level).toBe("fail");
    expect(platen?.message).toMatch(/^Platen/);
  });

  it.each([
    ["platen without a section", { platen: { rodSpacingMm: 300, dieWidthMm: 100, thicknessMm: 50, grade: "S355JR" } }, ["platen.widthMm"]],
    ["platen with an unknown key", { platen: { rodSpacingMm: 300, dieWidthMm: 100, thicknessMm: 50, grade: "S355JR", widthMm: 200, holes: 2 } }, ["platen.holes"]],
    ["throat with half a built-up section", { throat: { depthMm: 200, heightMm: 500, thicknessMm: 40, grade: "A36", areaMm2: 1000 } }, ["throat.sectionModulusMm3", "throat.inertiaMm4"]],
    ["throat with a bad grade", { throat: { depthMm: 200, heightMm: 500, thicknessMm: 40, grade: "S275", sectionDepthMm: 300 } }, ["throat.grade"]],
    ["die without a limit", { dies: [{ name: "Flat" }] }, ["dies.0.maxForceKn"]],
    ["two bolsters", { plates: [FULL_SIZING_INPUT.plates![1], FULL_SIZING_INPUT.plates![1]] }, ["plates"]],
  ])("400 for %s, naming the key", async (_name, patch, fields) => {
    const res = await call(sizingRequest({ ...GOOD, ...patch }));
    expect(res.status).toBe(400);
    const json = (await res.json()) as Body;
    expect(Object.keys(json.fieldErrors ?? {}).sort()).toEqual([...fields].sort());
  });
});

describe("POST /api/sizing — bad requests get 400 with a message per field", () => {
  const cyl = (patch: object) => ({ ...GOOD, cylinders: { ...GOOD.cylinders, ...patch } });
  it.each([
    ["zero bore", cyl({ boreMm: 0 }), ["cylinders.boreMm"]],
    ["negative bore", cyl({ boreMm: -101.6 }), ["cylinders.boreMm"]],
    ["rod as large as the bore", cyl({ rodMm: 101.6 }), ["cylinders.rodMm"]],
    ["numbers sent as strings", { ...GOOD, pressureBar: "2500 psi", motorKw: "5.5" }, ["pressureBar", "motorKw"]],
    ["null for a number", { ...GOOD, reliefBar: null }, ["reliefBar"]],
    ["missing fields", { pump: GOOD.pump }, ["cylinders", "pressureBar"]],
    ["missing nested fields", { ...GOOD, cylinders: { count: 1 } }, ["cylinders.boreMm", "cylinders.rodMm", "cylinders.strokeMm"]],
    ["absurd magnitudes", { ...cyl({ strokeMm: 1e9 }), pressureBar: 1e200 }, ["cylinders.strokeMm", "pressureBar"]],
    ["unknown keys", { ...GOOD, boreInches: 4, pump: { ...GOOD.pump, speed: 3 } }, ["boreInches", "pump.speed"]],
    ["an array instead of an object", [GOOD], ["body"]],
  ])("%s", async (_name, body, fields) => {
    const res = await call(sizingRequest(body));
    expect(res.status).toBe(400);
    const json = (await res.json()) as Body;
    expect(json.error).toBe("Invalid sizing input.");
    expect(Object.keys(json.fieldErrors ?? {}).sort()).toEqual([...fields].sort());
    for (const messages of Object.values(json.fieldErrors ?? {})) expect(messages[0]?.length).toBeGreaterThan(5);
  });

  it("NaN is not JSON, so it is refused as invalid JSON, as are other broken bodies", async () => {
    for (const text of ['{"pressureBar": NaN}', "{", "", "cylinders=1"]) {
      const res = await call(sizingRequest(text));
      expect(res.status, text).toBe(400);
      const json = (await res.json()) as Body;
      expect(json.error).toBe("Request body is not valid JSON.");
      expect(json.fieldErrors?.body).toEqual(["Send a JSON object."]);
    }
  });

  it("refuses a body far larger than any sizing input", async () => {
    const res = await call(sizingRequest({ ...GOOD, padding: "x".repeat(70_000) }));
    expect(res.status).toBe(413);
  });
});

describe("POST /api/sizing — rate limit per address", () => {
  it("answers 429 with Retry-After once an address has used up its window; other addresses unaffected", async () => {
    const ip = fakeIp();
    // Fill this window and the next (in case the clock rolls over mid-test), as earlier requests would have.
    const { windowMs, limit, name } = SIZING_API_LIMIT;
    const start = Math.floor(Date.now() / windowMs) * windowMs;
    await db.insert(rateLimitWindows).values([
      { bucket: `${name}:${ip}`, windowStart: new Date(start), hits: limit },
      { bucket: `${name}:${ip}`, windowStart: new Date(start + windowMs), hits: limit },
    ]);

    const refused = await call(sizingRequest(GOOD, ip));
    expect(refused.status).toBe(429);
    const retry = Number(refused.headers.get("retry-after"));
    expect(retry).toBeGreaterThanOrEqual(1);
    expect(retry).toBeLessThanOrEqual(windowMs / 1000);
    expect(((await refused.json()) as Body).error).toMatch(/Too many sizing requests/);
    expect((await call(sizingRequest(GOOD, fakeIp()))).status).toBe(200);
  });

  it("fixed windows: counts, remaining, Retry-After, and a new window starts from zero", async () => {
    const ip = fakeIp();
    const policy = { ...SIZING_API_LIMIT, name: `test-${randomUUID().slice(0, 8)}`, limit: 3 };
    const now = new Date(Date.UTC(2026, 0, 1, 12, 0, 30));
    const results = [];
    for (let i = 0; i < 5; i++) results.push(await hitRateLimit(policy, ip, now));
    expect(results.map((r) => r.allowed)).toEqual([true, true, true, false, false]);
    expect(results.map((r) => r.remaining)).toEqual([2, 1, 0, 0, 0]);
    expect(results[4]?.retryAfterS).toBe(30); // the window closes at 12:01:00

    const next = await hitRateLimit(policy, ip, new Date(now.getTime() + 60_000));
    expect(next).toMatchObject({ allowed: true, remaining: 2 });
    // Opening the new window dropped the old one.
    const rows = await db.select().from(rateLimitWindows).where(eq(rateLimitWindows.bucket, `${policy.name}:${ip}`));
    expect(rows).toHaveLength(1);
  });

  it("loses no hit under concurrency (one atomic upsert each)", async () => {
    const ip = fakeIp();
    const policy = { ...SIZING_API_LIMIT, name: `test-${randomUUID().slice(0, 8)}` };
    const now = new Date(Date.UTC(2026, 0, 1, 12, 0, 0));
    await Promise.all(Array.from({ length: 20 }, () => hitRateLimit(policy, ip, now)));
    const [row] = await db
      .select({ hits: rateLimitWindows.hits })
      .from(rateLimitWindows)
      .where(and(eq(rateLimitWindows.bucket, `${policy.name}:${ip}`), eq(rateLimitWindows.windowStart, now)));
    expect(row?.hits).toBe(20);
  });
});
