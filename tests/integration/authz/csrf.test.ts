// Cross-site request forgery: every mutating route row of the authorization matrix, sent with the
// manager's session cookie but from another site (foreign Origin), with `Sec-Fetch-Site:
// cross-site`, and with neither header, is refused with 403 and changes nothing in the database
// (CHECKSUM TABLE of every table, before and after).
import { beforeAll, describe, expect, it } from "vitest";
import { pool } from "@/db/client";
import { ROUTES, rowKey, type Call, type RouteRow } from "./matrix";
import { ORIGIN, send } from "./run";
import { makeWorld, type Shop } from "./world";

/** Mutating routes that do not act on a session cookie, so a cross-site call is no forgery. */
const NOT_COOKIE_AUTHENTICATED: Record<string, string> = {
  "POST app/api/sizing/route.ts": "stateless and reads no cookie: any site may call it",
  "POST app/api/jobs/reminders/route.ts": "authenticated by the JOBS_SECRET header, which a browser never adds by itself",
};

const VARIANTS: { name: string; headers: Record<string, string> }[] = [
  { name: "a foreign Origin", headers: { origin: "https://evil.example" } },
  { name: "Sec-Fetch-Site: cross-site", headers: { origin: ORIGIN, "sec-fetch-site": "cross-site" } },
  { name: "neither Origin nor Sec-Fetch-Site", headers: { origin: "" } },
];

let shop: Shop;
let tables: string[];

beforeAll(async () => {
  shop = (await makeWorld()).a;
  const [rows] = await pool.query("SELECT table_name AS name FROM information_schema.tables WHERE table_schema = DATABASE() AND table_type = 'BASE TABLE' ORDER BY table_name");
  tables = (rows as { name: string }[]).map((r) => r.name);
});

async function checksum(): Promise<string> {
  const [rows] = await pool.query(`CHECKSUM TABLE ${tables.map((t) => `\`${t}\``).join(", ")}`);
  return JSON.stringify(rows);
}

/** The request a signed-in manager of the shop would send (the first allowed case of a public row). */
async function managerCall(row: RouteRow): Promise<Call> {
  if (row.scope !== "public") return row.call(shop);
  const allowed = row.cases.find((c) => c.expect === "2xx") ?? row.cases[0]!;
  const { headers = {}, ...call } = await allowed.call(shop);
  // Keep a case's own cookie (sign-out's), but not its test-only headers such as a foreign Origin.
  return { ...call, headers: headers.cookie ? { cookie: headers.cookie } : {} };
}

const mutating = ROUTES.filter((r) => r.method !== "GET" && !(rowKey(r) in NOT_COOKIE_AUTHENTICATED));

describe("cross-site writes are refused and change nothing", () => {
  it("covers every mutating route of the matrix", () => {
    expect(mutating.length + Object.keys(NOT_COOKIE_AUTHENTICATED).length).toBe(ROUTES.filter((r) => r.method !== "GET").length);
  });

  it("would see a change: the same request from the app's own page does change the database", async () => {
    const row = mutating.find((r) => rowKey(r) === "POST app/api/presses/route.ts")!;
    const before = await checksum();
    const res = await send(row.file, row.method, await managerCall(row), shop.cookies.manager);
    expect(res.status).toBe(201);
    expect(await checksum()).not.toBe(before);
  });

  it.each(mutating.map((r) => [rowKey(r), r] as const))("%s", async (_key, row) => {
    for (const variant of VARIANTS) {
      const call = await managerCall(row);
      const before = await checksum();
      const res = await send(row.file, row.method, call, shop.cookies.manager, variant.headers);
      expect(res.status, `${variant.name}: ${await res.clone().text()}`).toBe(403);
      expect(await checksum(), `${variant.name} changed the database`).toBe(before);
    }
  });
});
