// Runs every cell of the authorization matrix (matrix.ts) against the real MariaDB and counts the
// cells whose answer differs from the rule. Also fails when a route handler or a server action
// exists without a row, so a new route cannot ship without saying who may call it.
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { db } from "@/db/client";
import { memberships } from "@/db/schema";
import { ForbiddenError, NotFoundError } from "@/lib/auth/permissions";
import { createInvitation, revokeInvitation } from "@/lib/data/invitations";
import { createPlannedPressFromSizing } from "@/lib/data/presses";
import { removeComponent } from "@/lib/data/components";
import { createServiceTask, updateServiceTask } from "@/lib/data/service-plan";
import { changeMemberRole, removeMember, updateOpeningHours, updateShop } from "@/lib/data/shops";
import { regenerateStatusToken } from "@/lib/data/status-page";
import { plannedPressSchema } from "@/lib/validation/planned-press";
import { LOCAL_UPLOADTHING_PORT, localUploadthingEnv } from "@/lib/uploads/env";
import { FULL_SIZING_INPUT } from "../../fixtures/sizing-inputs";
import { makeUser } from "../helpers";
import { ACTIONS, JOBS_TEST_SECRET, ROUTES, rowKey, type DataCell, type Outcome, type RouteRow } from "./matrix";
import { routeFiles } from "../../app-files";
import { outcomeOf, routeHandlers, send, serverActionExports } from "./run";
import { freshComponent, freshPress, makeWorld, ROLES, type Shop, type ShopRole } from "./world";

// Stored photo files live in the upload service; the matrix is about who may reach them, not storage.
vi.mock("@/lib/uploads/storage", async (importOriginal) => ({
  ...(await importOriginal<typeof import("@/lib/uploads/storage")>()),
  deleteStoredFiles: async () => undefined,
  fetchStoredFile: async () => new Response("jpeg", { headers: { "content-length": "4" } }),
}));

let world: { a: Shop; b: Shop };
const savedEnv = { ...process.env };

beforeAll(async () => {
  process.env.JOBS_SECRET = JOBS_TEST_SECRET;
  // The upload SDK needs its configuration to verify a callback's signature (no service is called).
  Object.assign(process.env, localUploadthingEnv(Number(process.env.FAKE_UT_PORT ?? LOCAL_UPLOADTHING_PORT)), { UPLOADTHING_LOG_LEVEL: "None" });
  world = await makeWorld();
});
afterAll(() => {
  process.env = savedEnv;
});

type Cell = { name: string; expected: Outcome; actual: string };

/** Every cell of one route row: 2 shops × 3 roles × own and foreign object, plus signed out. */
async function routeCells(row: RouteRow): Promise<Cell[]> {
  const cells: Cell[] = [];
  const at = async (name: string, expected: Outcome, run: () => Promise<Response>) => {
    const res = await run();
    if (process.env.MATRIX_DEBUG && res.status >= 400) console.info(rowKey(row), name, res.status, await res.clone().text());
    cells.push({ name: `${rowKey(row)} ${name}`, expected, actual: outcomeOf(res.status) });
  };
  if (row.scope === "public") {
    for (const c of row.cases) {
      const call = await c.call(world.a);
      await at(c.name, c.expect, () => send(row.file, row.method, call, call.session === false ? null : world.a.cookies.member));
    }
    return cells;
  }
  for (const [mine, other] of [[world.a, world.b], [world.b, world.a]] as const) {
    for (const role of ROLES) {
      const ownCall = await row.call(mine);
      await at(`${role} own`, row.scope === "shop" ? row.own[role] : "2xx", () => send(row.file, row.method, ownCall, mine.cookies[role]));
      if (row.scope === "shop") {
        const foreignCall = await row.call(other);
        await at(`${role} foreign`, row.foreign ?? "404", () => send(row.file, row.method, foreignCall, mine.cookies[role]));
      }
    }
  }
  const anonymous = await row.call(world.a);
  await at("signed out", "401", () => send(row.file, row.method, anonymous, null));
  return cells;
}

/** Data-layer functions behind actions that no route calls, with the same own/foreign rule. */
const DATA: Record<DataCell, { own: Record<ShopRole, Outcome>; run: (actor: { userId: string }, shop: Shop) => Promise<unknown> }> = {
  removeComponent: { own: manager(), run: async (actor, s) => removeComponent(actor, await freshComponent(s), { reason: "Worn out", removedOn: "2026-01-08" }) },
  updateServiceTask: {
    own: manager(),
    run: async (actor, s) => {
      const { id } = await createServiceTask({ userId: s.users.manager.userId }, s.pressId, { title: "Matrix task", kind: "oil-changed", intervalDays: 90 });
      return updateServiceTask(actor, id, { title: "Matrix task renamed", kind: "oil-changed", intervalDays: 120 });
    },
  },
  regenerateStatusToken: { own: manager(), run: async (actor, s) => regenerateStatusToken(actor, await freshPress(s)) },
  updateShop: { own: manager(), run: (actor, s) => updateShop(actor, s.shopId, { name: "Matrix shop", timeZone: "Europe/London" }) },
  updateOpeningHours: { own: manager(), run: (actor, s) => updateOpeningHours(actor, s.shopId, null) },
  changeMemberRole: { own: manager(), run: async (actor, s) => changeMemberRole(actor, s.shopId, await extraMember(s), "inspector") },
  removeMember: { own: manager(), run: async (actor, s) => removeMember(actor, s.shopId, await extraMember(s)) },
  createInvitation: { own: manager(), run: (actor, s) => createInvitation(actor, s.shopId, { email: `invitee${Math.random().toString(36).slice(2)}@test.example`, role: "member" }, null) },
  revokeInvitation: {
    own: manager(),
    run: async (actor, s) => {
      const { id } = await createInvitation({ userId: s.users.manager.userId }, s.shopId, { email: `invitee${Math.random().toString(36).slice(2)}@test.example`, role: "member" }, null);
      return revokeInvitation(actor, id);
    },
  },
  createPlannedPressFromSizing: {
    own: manager(),
    run: (actor, s) => {
      const { sizingInput, ...plan } = plannedPressSchema.parse({ name: "Matrix planned", frameType: "h-frame", sizingInput: JSON.stringify(FULL_SIZING_INPUT) });
      return createPlannedPressFromSizing(actor, s.shopId, { ...plan, input: sizingInput });
    },
  },
};

function manager(): Record<ShopRole, Outcome> {
  return { manager: "2xx", inspector: "403", member: "403" };
}

async function extraMember(s: Shop): Promise<string> {
  const u = await makeUser();
  await db.insert(memberships).values({ shopId: s.shopId, userId: u.userId, role: "member" });
  return u.userId;
}

async function dataOutcome(run: () => Promise<unknown>): Promise<string> {
  try {
    await run();
    return "2xx";
  } catch (error) {
    if (error instanceof NotFoundError) return "404";
    if (error instanceof ForbiddenError) return "403";
    return `error: ${error instanceof Error ? error.message : String(error)}`;
  }
}

async function dataCells(name: DataCell): Promise<Cell[]> {
  const { own, run } = DATA[name];
  const cells: Cell[] = [];
  for (const [mine, other] of [[world.a, world.b], [world.b, world.a]] as const) {
    for (const role of ROLES) {
      const actor = { userId: mine.users[role].userId };
      cells.push({ name: `data ${name} ${role} own`, expected: own[role], actual: await dataOutcome(() => run(actor, mine)) });
      cells.push({ name: `data ${name} ${role} foreign`, expected: "404", actual: await dataOutcome(() => run(actor, other)) });
    }
  }
  return cells;
}

describe("authorization matrix", () => {
  it("has a row for every exported method of every route file, and no row for anything else", async () => {
    const onDisk: string[] = [];
    for (const file of routeFiles()) {
      for (const method of Object.keys(await routeHandlers(file))) onDisk.push(`${method} ${file}`);
    }
    expect(ROUTES.map(rowKey).sort()).toEqual(onDisk.sort());
  });

  it("has a row for every server action, and every row it refers to exists", () => {
    const exported = serverActionExports().map((a) => `${a.file} ${a.name}`).sort();
    expect(ACTIONS.map((a) => `${a.file} ${a.name}`).sort()).toEqual(exported);
    const routeKeys = new Set(ROUTES.map(rowKey));
    for (const action of ACTIONS) if ("route" in action) expect(routeKeys, `${action.name} → ${action.route}`).toContain(action.route);
  });

  it("answers every cell as its rule says (0 mismatches)", async () => {
    const cells: Cell[] = [];
    for (const row of ROUTES) cells.push(...(await routeCells(row)));
    const routeCellCount = cells.length;
    const dataNames = [...new Set(ACTIONS.flatMap((a) => ("data" in a ? [a.data] : [])))];
    for (const name of dataNames) cells.push(...(await dataCells(name)));
    const mismatches = cells.filter((c) => c.expected !== c.actual);
    console.info(
      `[authz matrix] ${ROUTES.length} route rows, ${ACTIONS.length} action rows; ${cells.length} cells ` +
        `(${routeCellCount} through route handlers, ${cells.length - routeCellCount} through the data layer); mismatches: ${mismatches.length}`,
    );
    expect(mismatches.map((c) => `${c.name}: expected ${c.expected}, got ${c.actual}`)).toEqual([]);
  }, 180_000);
});
