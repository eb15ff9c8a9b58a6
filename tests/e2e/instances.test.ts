/**
 * Two production instances on different ports against one MariaDB (issue 13, item 6b; the README's
 * scaling claim): sessions, sign-out, the sizing rate limit, the sign-in throttle and the booking
 * race all hold across instances because their state lives in MariaDB, not in a process. Both run
 * against a scratch MariaDB server (tests/scratch-mariadb.ts) seeded with the demo data.
 *
 * `npm test` runs 2 booking rounds; BOOKING_RACE_ROUNDS=20 runs the full 20.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_PASSWORD, DEMO_USERS } from "@/db/demo-data";
import { LIMITS } from "@/lib/auth/throttle-policy";
import { SIZING_API_LIMIT } from "@/lib/rate-limit";
import { FULL_SIZING_INPUT } from "../fixtures/sizing-inputs";
import { scratchMariaDb, startAppServer, type AppServer } from "../scratch-mariadb";
import { call, signInApi, usablePressId } from "./api-client";

const ROUNDS = Number(process.env.BOOKING_RACE_ROUNDS ?? 2);
const TEST_PORT = Number(process.env.TEST_PORT ?? 3100);
const PORTS = [Number(process.env.INSTANCE_A_PORT ?? TEST_PORT + 100), Number(process.env.INSTANCE_B_PORT ?? TEST_PORT + 200)] as const;
const DATABASE = "presswright";

const scratch = scratchMariaDb("instances", 2);
let servers: AppServer[] = [];
const user = (key: string) => DEMO_USERS.find((u) => u.key === key)!;
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

beforeAll(async () => {
  await scratch.start();
  await scratch.migrate(DATABASE);
  await scratch.seed(DATABASE);
  // Opening hours are the booking rules' business (tested elsewhere); here any slot is in hours.
  await scratch.sql(DATABASE, "UPDATE shops SET opening_hours = NULL");
  // One after the other: two cold starts at once on a 2-core machine only slow both.
  for (const port of PORTS) servers.push(await startAppServer(port, scratch.appUrl(DATABASE)));
}, 300_000);

afterAll(async () => {
  await Promise.all(servers.map((s) => s.stop()));
  servers = [];
  await scratch.stop();
}, 60_000);

describe("two app instances on one MariaDB", () => {
  it("a session made on one works on the other, and signing out on one ends it on both", async () => {
    const [a, b] = servers as [AppServer, AppServer];
    const cookie = await signInApi(a.baseUrl, user("member1").email);
    const onA = await call(a.baseUrl, "/api/me", { cookie });
    const onB = await call(b.baseUrl, "/api/me", { cookie });
    expect(onA.status).toBe(200);
    expect(onB.status, onB.body).toBe(200);
    expect((JSON.parse(onB.body) as { user: { id: string } }).user.id).toBe((JSON.parse(onA.body) as { user: { id: string } }).user.id);

    expect((await call(b.baseUrl, "/api/auth/sign-out", { method: "POST", cookie })).status).toBe(204);
    expect((await call(a.baseUrl, "/api/me", { cookie })).status).toBe(401);
    expect((await call(b.baseUrl, "/api/me", { cookie })).status).toBe(401);
  });

  it("the sizing rate limit counts requests to both instances together", async () => {
    // A fixed one-minute window: start at the beginning of one, so all requests fall inside it.
    const intoWindow = Date.now() % SIZING_API_LIMIT.windowMs;
    if (intoWindow > SIZING_API_LIMIT.windowMs - 30_000) await sleep(SIZING_API_LIMIT.windowMs - intoWindow + 100);
    const statuses: number[] = [];
    for (let i = 0; i < SIZING_API_LIMIT.limit + 10; i++) {
      statuses.push((await call(servers[i % 2]!.baseUrl, "/api/sizing", { body: FULL_SIZING_INPUT })).status);
    }
    expect(statuses.filter((s) => s === 200)).toHaveLength(SIZING_API_LIMIT.limit);
    expect(statuses.slice(SIZING_API_LIMIT.limit)).toEqual(Array(10).fill(429));
  });

  it("the sign-in throttle counts failures on both instances together", async () => {
    const email = user("member2").email;
    for (let i = 0; i < LIMITS.account.free; i++) {
      const answer = await call(servers[i % 2]!.baseUrl, "/api/auth/sign-in", { body: { email, password: `wrong password ${i}` } });
      expect(answer.status, `attempt ${i + 1}`).toBe(401);
    }
    // Neither instance lets even the right password through now.
    for (const server of servers) {
      const answer = await call(server.baseUrl, "/api/auth/sign-in", { body: { email, password: DEMO_PASSWORD } });
      expect(answer.status, server.baseUrl).toBe(429);
      expect(Number(answer.headers.get("retry-after"))).toBeGreaterThan(0);
    }
    // Leave the account usable for anything after this file.
    await scratch.sql(DATABASE, "DELETE FROM login_throttle");
  });

  it(`50 overlapping bookings spread over both instances: exactly one 201, 49 × 409 (${ROUNDS} rounds)`, { timeout: 60_000 * ROUNDS }, async () => {
    const keys = ["manager", "inspector", "member1", "member2"];
    const cookies = await Promise.all(keys.map((k, i) => signInApi(servers[i % 2]!.baseUrl, user(k).email)));
    const pressId = await usablePressId(servers[0]!.baseUrl, cookies[0]!);
    for (let round = 0; round < ROUNDS; round++) {
      // Every slot covers hour 2..3 of a day ahead, with varying starts and lengths.
      const day = new Date(Date.now() + (3 + round) * 86_400_000);
      day.setUTCHours(8, 0, 0, 0);
      const at = (h: number) => new Date(day.getTime() + h * 3_600_000).toISOString();
      const answers = await Promise.all(
        Array.from({ length: 50 }, (_, i) =>
          call(servers[i % 2]!.baseUrl, `/api/presses/${pressId}/bookings`, {
            body: { startsAt: at(i % 3), endsAt: at(3 + (i % 2)) },
            cookie: cookies[i % cookies.length],
          }),
        ),
      );
      const statuses = answers.map((a) => a.status);
      const winner = statuses.indexOf(201);
      console.log(`[instances] booking round ${round + 1}: ${statuses.filter((s) => s === 201).length} × 201 (on instance ${winner % 2 ? "B" : "A"}), ${statuses.filter((s) => s === 409).length} × 409, others ${statuses.filter((s) => s !== 201 && s !== 409).length}`);
      expect(statuses.filter((s) => s === 201), JSON.stringify(statuses)).toHaveLength(1);
      expect(statuses.filter((s) => s === 409)).toHaveLength(49);
    }
  });
});
