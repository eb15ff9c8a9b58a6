/**
 * What the benchmark measures, with the ids filled in from the database it runs against (demo or
 * scale data), and the sign-in through the real sign-in API.
 */
import mysql from "mysql2/promise";
import { newId } from "../../lib/ids";
import { FULL_SIZING_INPUT } from "../../tests/fixtures/sizing-inputs";

export type Kind = "floor" | "signed-in page" | "json" | "public";
/**
 * `expectedStatus`: a target whose right answer is not 2xx (the 404 page); only other answers count as errors.
 * `manyClients`: every request comes from another address (X-Forwarded-For through the bench server's one
 * trusted proxy hop), so a per-address limit measures its bookkeeping, not its refusals.
 */
export type Target = { key: string; label: string; method: "GET" | "POST"; path: string; body?: string; signedIn: boolean; kind: Kind; expectedStatus?: number; manyClients?: boolean };

/** Ids a dataset's targets need: the signed-in user's shop, its press with the longest history, an ordinary one. */
export type DatasetIds = { heavyPressId: string; ordinaryPressId: string; statusToken: string; segments: Record<string, string> };

export async function resolveIds(migrateUrl: string, email: string): Promise<DatasetIds> {
  const connection = await mysql.createConnection({ uri: migrateUrl, timezone: "Z" });
  try {
    const [presses] = await connection.query<mysql.RowDataPacket[]>(
      `SELECT p.id, p.status_token, (SELECT COUNT(*) FROM service_entries e WHERE e.press_id = p.id) AS entries
         FROM users u JOIN presses p ON p.shop_id = COALESCE(u.active_shop_id, (SELECT m.shop_id FROM memberships m WHERE m.user_id = u.id ORDER BY m.created_at LIMIT 1))
        WHERE u.email = ? AND p.lifecycle = 'in-service'
        ORDER BY entries DESC, p.name`,
      [email],
    );
    if (presses.length < 2) throw new Error(`${email} needs an active shop with two presses in service (seeded?)`);
    const heavy = presses[0]!;
    const ordinary = presses[Math.floor(presses.length / 2)]!;
    // The public status page needs the press's token; a manager would make it from the status card.
    let statusToken = heavy.status_token as string | null;
    if (!statusToken) {
      statusToken = newId();
      await connection.query("UPDATE presses SET status_token = ? WHERE id = ?", [statusToken, heavy.id]);
    }
    // Values for every dynamic segment, so first-load JS can be measured on every route.
    const one = async (sql: string) => String(((await connection.query<mysql.RowDataPacket[]>(sql, [heavy.id]))[0][0] ?? { id: "" }).id);
    const segments = {
      pressId: String(heavy.id),
      componentId: await one("SELECT id FROM components WHERE press_id = ? AND removed_on IS NULL LIMIT 1"),
      entryId: await one("SELECT id FROM service_entries WHERE press_id = ? ORDER BY performed_on DESC LIMIT 1"),
      inspectionId: await one("SELECT id FROM inspections WHERE press_id = ? ORDER BY chain_seq DESC LIMIT 1"),
      templateId: await one("SELECT t.id FROM inspection_templates t JOIN presses p ON p.shop_id = t.shop_id WHERE p.id = ? LIMIT 1"),
      token: statusToken,
    };
    return { heavyPressId: String(heavy.id), ordinaryPressId: String(ordinary.id), statusToken, segments };
  } finally {
    await connection.end();
  }
}

export function targets(ids: DatasetIds): Target[] {
  const page = (key: string, label: string, path: string, kind: Kind = "signed-in page"): Target => ({ key, label, method: "GET", path, signedIn: kind !== "public", kind });
  return [
    page("floor", "Floor page (shell + one indexed query)", "/bench/floor", "floor"),
    { key: "json-floor", label: "JSON baseline GET /api/me (session + one indexed query)", method: "GET", path: "/api/me", signedIn: true, kind: "json" },
    page("dashboard", "Dashboard", "/dashboard"),
    page("heavy-press", "Press page, press with the longest history", `/presses/${ids.heavyPressId}`),
    page("press", "Press page, ordinary press", `/presses/${ids.ordinaryPressId}`),
    // The service log has no page of its own: the press page shows its first page and the table pages through this API.
    { key: "service-log", label: "Service log, a page of entries (press with the longest history)", method: "GET", path: `/api/presses/${ids.heavyPressId}/service-log?limit=25`, signedIn: true, kind: "signed-in page" },
    page("status", "Shop status (press list with each press's status)", "/presses"),
    page("bookings", "Bookings list", "/bookings"),
    { key: "sizing-api", label: "POST /api/sizing", method: "POST", path: "/api/sizing", body: JSON.stringify(FULL_SIZING_INPUT), signedIn: false, kind: "json", manyClients: true },
    page("landing", "Landing page (public)", "/", "public"),
    page("sizing", "Sizing page (public)", "/sizing", "public"),
    page("sign-in", "Sign-in page (public)", "/sign-in", "public"),
    page("press-status", "Public press status page /status/{token}", `/status/${ids.statusToken}`, "public"),
    // What a prerendered page serves on this machine: the yardstick for the public pages' target.
    { ...page("not-found", "Prerendered 404 page (reference)", "/no-such-page", "public"), expectedStatus: 404 },
  ];
}

/** Signs in through POST /api/auth/sign-in and returns the Cookie header value. */
export async function signIn(base: string, email: string, password: string): Promise<string> {
  const res = await fetch(`${base}/api/auth/sign-in`, { method: "POST", headers: { "content-type": "application/json", origin: base }, body: JSON.stringify({ email, password }) });
  if (!res.ok) throw new Error(`sign-in as ${email}: HTTP ${res.status} ${await res.text()}`);
  const cookies = res.headers.getSetCookie().map((c) => c.split(";")[0]!);
  if (cookies.length === 0) throw new Error("sign-in set no cookie");
  return cookies.join("; ");
}

export function requestHeaders(target: Target, base: string, cookie: string): Record<string, string> {
  return {
    ...(target.signedIn ? { cookie } : {}),
    ...(target.method === "POST" ? { "content-type": "application/json", origin: base } : {}),
    "accept-encoding": "identity",
    // autocannon's idReplacement puts a fresh id in place of [<id>] on every request.
    ...(target.manyClients ? { "x-forwarded-for": "bench-client-[<id>]" } : {}),
  };
}
