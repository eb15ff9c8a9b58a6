// Fuzzes the JSON body of every route handler that reads one (issue 13 item 4), through the real
// handlers against the real MariaDB, as the role the authorization matrix lets write. Bodies are
// well-shaped values of the route's schema and hostile variants of them (arbitraries.ts), plus
// bodies that are not JSON objects at all. Property: never a 5xx; a 4xx answers a JSON `error`; a
// 2xx stored exactly what the schema parsed. Afterwards every queued e-mail must have single-line
// headers, as written by nodemailer. Seed, runs and a single route come from FUZZ_SEED, FUZZ_RUNS,
// FUZZ_ROUTE (and FUZZ_PATH to replay one counterexample); the seed is printed on every run.
import { readFileSync } from "node:fs";
import path from "node:path";
import { gte, inArray, like, or } from "drizzle-orm";
import fc from "fast-check";
import nodemailer from "nodemailer";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { emailOutbox, loginThrottle, rateLimitWindows } from "@/db/schema";
import { CLIENT_IP_HEADER } from "@/lib/auth/client-ip";
import { getTemplate } from "@/lib/data/inspection-templates";
import { LOCAL_UPLOADTHING_PORT, localUploadthingEnv } from "@/lib/uploads/env";
import { ROOT } from "../../app-files";
import { ROUTES, rowKey, type Call, type RouteRow } from "../authz/matrix";
import { send } from "../authz/run";
import { makeWorld, nextSlot, ROLES } from "../authz/world";
import { hostileVariant, RAW_BODIES, toJsonText } from "./arbitraries";
import { differences, FUZZ, NO_BODY, type FuzzShop, type FuzzSpec } from "./bodies";

const SEED = Number(process.env.FUZZ_SEED ?? Math.floor(Math.random() * 2 ** 31));
const RUNS = Number(process.env.FUZZ_RUNS ?? 12);
const ONLY = process.env.FUZZ_ROUTE;
const REPLAY_PATH = process.env.FUZZ_PATH;

let shop: FuzzShop;
let started: Date;
let requestCount = 0;
const savedEnv = { ...process.env };

beforeAll(async () => {
  // The upload SDK needs its configuration to answer at all (no service is called).
  Object.assign(process.env, localUploadthingEnv(Number(process.env.FAKE_UT_PORT ?? LOCAL_UPLOADTHING_PORT)), { UPLOADTHING_LOG_LEVEL: "None" });
  started = new Date(Date.now() - 1000);
  const { a } = await makeWorld();
  const monthly = await getTemplate({ userId: a.users.manager.userId }, a.monthlyTemplateId);
  shop = { ...a, monthlyItemKeys: monthly.items.map((i) => i.key) };
  console.info(`[fuzz] seed ${SEED}, ${RUNS} runs per route (replay: FUZZ_SEED=${SEED} FUZZ_RUNS=${RUNS} FUZZ_ROUTE='<route>' FUZZ_PATH='<path>')`);
});

afterAll(async () => {
  process.env = savedEnv;
  // Leave the shared test database as found: throttle counters and queued mail of this file only.
  await db.delete(loginThrottle).where(like(loginThrottle.subject, "fuzz-%"));
  await db.delete(rateLimitWindows).where(like(rateLimitWindows.bucket, "%:fuzz-%"));
  await db.delete(emailOutbox).where(gte(emailOutbox.createdAt, started));
});

const BODY_METHODS = new Set(["POST", "PATCH", "PUT"]);
const bodyRows = ROUTES.filter((r) => BODY_METHODS.has(r.method));
const fuzzed = bodyRows.filter((r) => rowKey(r) in FUZZ && (!ONLY || rowKey(r).includes(ONLY)));

/** The role that may write, so bodies reach the schema and the data layer (not a 403 first). */
function writerCookie(row: RouteRow, call: Call): string | null {
  if (call.session === false) return null;
  if (row.scope !== "shop") return shop.cookies.member;
  return shop.cookies[ROLES.find((role) => row.own[role] === "2xx") ?? "manager"];
}

/** The row's request (a public row's first allowed case), without its body. */
async function baseCall(row: RouteRow, spec: FuzzSpec): Promise<Call> {
  if (spec.call) return spec.call(shop);
  if (row.scope !== "public") return row.call(shop);
  const { headers = {}, ...call } = await (row.cases.find((c) => c.expect === "2xx") ?? row.cases[0]!).call(shop);
  return { ...call, headers: headers.cookie ? { cookie: headers.cookie } : {} };
}

/** Sends the bytes; a fresh client address per request, so throttles never hide what comes after them. */
async function sendBody(row: RouteRow, spec: FuzzSpec, raw: string | Uint8Array<ArrayBuffer>): Promise<{ call: Call; res: Response; text: string }> {
  const { body: _unused, ...call } = await baseCall(row, spec);
  requestCount += 1;
  const res = await send(row.file, row.method, { ...call, raw }, writerCookie(row, call), { [CLIENT_IP_HEADER]: `fuzz-${SEED}-${requestCount}` });
  return { call, res, text: await res.text() };
}

/** The property's failures for one answer (empty when it holds). */
function answerProblems(res: Response, text: string): string[] {
  const polluted = Object.keys(Object.prototype).length > 0 || "polluted" in {};
  const problems = polluted ? ["Object.prototype was polluted"] : [];
  if (res.status >= 500) return [...problems, `answered ${res.status}: ${text.slice(0, 300)}`];
  if (res.status >= 400) {
    let error: unknown;
    try {
      error = (JSON.parse(text) as { error?: unknown }).error;
    } catch {
      return [...problems, `answered ${res.status} without a JSON body: ${text.slice(0, 200)}`];
    }
    if (typeof error !== "string" || error.length === 0) problems.push(`answered ${res.status} without an error message: ${text.slice(0, 200)}`);
  }
  return problems;
}

async function storedProblems(spec: FuzzSpec, call: Call, raw: string, responseText: string): Promise<string[]> {
  if (!("parse" in spec)) return [];
  let parsed: unknown;
  try {
    parsed = spec.parse(JSON.parse(raw));
  } catch (error) {
    return [`accepted a body its schema refuses: ${error instanceof Error ? error.message.slice(0, 300) : String(error)}`];
  }
  const response = (responseText ? JSON.parse(responseText) : {}) as Record<string, unknown>;
  const actor = { userId: shop.users.manager.userId };
  const { actual, expected } = await spec.stored({ actor, call, response, parsed: parsed as Record<string, unknown>, shop });
  return differences(expected, actual);
}

describe("every route that reads a JSON body is fuzzed", () => {
  it("has a fuzz entry for every POST/PATCH/PUT row of the matrix, or reads no body", () => {
    const keys: string[] = bodyRows.map(rowKey);
    const missing = keys.filter((k) => !(k in FUZZ) && !(k in NO_BODY));
    expect(missing, "add an entry to FUZZ in tests/integration/fuzz/bodies.ts").toEqual([]);
    expect([...Object.keys(FUZZ), ...Object.keys(NO_BODY)].filter((k) => !keys.includes(k)), "entries without a route").toEqual([]);
    for (const key of Object.keys(NO_BODY)) {
      const text = readFileSync(path.join(ROOT, key.split(" ")[1]!), "utf8");
      expect(text, `${key} reads a body after all`).not.toMatch(/readJsonBody|readBodyText|\.json\(\)|\.text\(\)|formData\(\)/);
    }
  });
});

describe.each(fuzzed.map((r) => [rowKey(r), r] as const))("%s", (key, row) => {
  const spec = FUZZ[key]!;

  it("never answers 5xx, refuses with a JSON message, and stores what its schema parsed", async () => {
    const valid = spec.valid(shop);
    const body = fc.oneof({ weight: 2, arbitrary: valid }, { weight: 3, arbitrary: hostileVariant(valid) });
    const outcomes = new Map<number, number>();
    const property = fc.asyncProperty(body, async (value) => {
      const raw = toJsonText(value);
      const { call, res, text } = await sendBody(row, spec, raw);
      outcomes.set(res.status, (outcomes.get(res.status) ?? 0) + 1);
      if (process.env.FUZZ_DEBUG && res.status >= 400) console.info(`[fuzz] ${key} ${res.status} ${text.slice(0, 300)} ← ${raw.slice(0, 300)}`);
      const problems = answerProblems(res, text);
      if (problems.length === 0 && res.ok) problems.push(...(await storedProblems(spec, call, raw, text)));
      if (problems.length > 0) throw new Error(problems.join("\n"));
    });
    const details = await fc.check(property, { seed: SEED, numRuns: RUNS, path: REPLAY_PATH, endOnFailure: !process.env.FUZZ_SHRINK });
    const statuses = [...outcomes].sort(([a], [b]) => a - b).map(([s, n]) => `${s}×${n}`).join(" ");
    console.info(`[fuzz] ${key}: ${details.numRuns} runs, seed ${SEED}${details.failed ? `, FAILED at path ${details.counterexamplePath}` : ""}; answers ${statuses}`);
    const failure = details.errorInstance instanceof Error ? details.errorInstance.message : "";
    expect(details.failed, `${fc.defaultReportMessage(details) ?? ""}\n${failure}`).toBe(false);
  }, 120_000);

  it("refuses bodies that are not a JSON object with a JSON message, never 5xx", async () => {
    const problems: string[] = [];
    for (const raw of RAW_BODIES) {
      const { res, text } = await sendBody(row, spec, raw.bytes);
      problems.push(...answerProblems(res, text).map((p) => `${raw.name}: ${p}`));
    }
    expect(problems).toEqual([]);
  }, 60_000);
});

describe("e-mail headers after fuzzing", () => {
  const NAMES = ["Press\r\nBcc: victim@example.com", "Press\nSubject: injected", "Press\r\n\r\n<body>", "Press\u0000\u2028\u0085x", "Pr\u00e9ss \ud83d\ude00 \u202e"];
  const HEADERS = new Set(["from", "to", "subject", "message-id", "date", "mime-version", "content-type", "content-transfer-encoding"]);

  it("queues only single-line subjects and recipients, and nodemailer writes no header of the input's", async () => {
    // Names with line breaks reach subjects through real requests: create, book, tag out, stop-use report.
    const post = (file: string, call: Call, cookie: string) => send(file, "POST", call, cookie);
    for (const name of NAMES) {
      const created = await post("app/api/presses/route.ts", { path: "/api/presses", body: { name, frameType: "h-frame", lifecycle: "in-service", shopId: shop.shopId } }, shop.cookies.manager);
      expect(created.status, await created.clone().text()).toBe(201);
      const { id } = (await created.json()) as { id: string };
      const params = { pressId: id };
      const booked = await post("app/api/presses/[pressId]/bookings/route.ts", { path: `/api/presses/${id}/bookings`, params, body: nextSlot() }, shop.cookies.member);
      expect(booked.status, await booked.clone().text()).toBe(201);
      await post("app/api/presses/[pressId]/tag-outs/route.ts", { path: `/api/presses/${id}/tag-outs`, params, body: { reason: `Leak\r\nBcc: victim@example.com` } }, shop.cookies.manager);
      await post("app/api/presses/[pressId]/problems/route.ts", { path: `/api/presses/${id}/problems`, params, body: { description: "Burst hose\r\nCc: x@example.com", severity: "high", stopUse: true } }, shop.cookies.member);
    }
    const rows = await db.select().from(emailOutbox).where(or(gte(emailOutbox.createdAt, started), inArray(emailOutbox.shopId, [shop.shopId])));
    expect(rows.length).toBeGreaterThan(NAMES.length);
    const composer = nodemailer.createTransport({ streamTransport: true, buffer: true, newline: "\r\n" });
    const problems: string[] = [];
    for (const row of rows) {
      if (/[\r\n\u0000-\u001f\u007f]/.test(row.subject) || /[\r\n\u0000-\u001f\u007f]/.test(row.toAddress)) problems.push(`${row.id}: control character in a header value`);
      const info = await composer.sendMail({ from: "Presswright <no-reply@presswright.invalid>", to: row.toAddress, subject: row.subject, text: row.textBody, html: row.htmlBody });
      const head = (info.message as Buffer).toString("utf8").split("\r\n\r\n")[0]!;
      const names = head.split("\r\n").filter((line) => !/^[ \t]/.test(line)).map((line) => line.slice(0, line.indexOf(":")).toLowerCase());
      const unexpected = names.filter((n) => !HEADERS.has(n));
      if (unexpected.length > 0 || names.filter((n) => n === "subject").length !== 1) problems.push(`${row.id}: headers ${names.join(", ")}`);
    }
    console.info(`[fuzz] e-mail: ${rows.length} queued messages checked`);
    expect(problems).toEqual([]);
  }, 60_000);
});
