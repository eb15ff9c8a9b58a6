import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { GET as dueRoute } from "@/app/api/due/route";
import { GET as logGet, POST as logPost } from "@/app/api/presses/[pressId]/service-log/route";
import { GET as planGet, POST as planPost } from "@/app/api/presses/[pressId]/service-plan/route";
import { PATCH as entryPatch } from "@/app/api/service-log/[entryId]/route";
import { db } from "@/db/client";
import { components, hourMeterReadings, memberships, serviceEntries, serviceEntryRevisions, serviceTasks } from "@/db/schema";
import { createSession } from "@/lib/auth/session";
import { createComponent } from "@/lib/data/components";
import { createPress } from "@/lib/data/press-edits";
import { authorizePhotoTarget, createPhotoRecord, listServiceEntryPhotos } from "@/lib/data/photos";
import { listServiceDueByPress } from "@/lib/data/service-due";
import { createServiceEntry, listServiceEntries } from "@/lib/data/service-log";
import { newId } from "@/lib/ids";
import { localDate, addLocalDays } from "@/lib/schedule";
import { componentInputSchema } from "@/lib/validation/press";
import { serviceEntryInputSchema } from "@/lib/validation/service";
import { getRequest, jsonRequest, makeUser } from "./helpers";

type U = Awaited<ReturnType<typeof makeUser>>;
let manager: U;
let inspector: U;
let member: U;
let outsider: U;
let pressId: string;
const cookie = async (u: U) => ({ cookie: `session=${(await createSession(u.userId)).token}` });
const params = <K extends string>(key: K, value: string) => ({ params: Promise.resolve({ [key]: value } as Record<K, string>) });
const today = () => localDate(new Date(), "UTC");

beforeAll(async () => {
  [manager, inspector, member, outsider] = await Promise.all([makeUser(), makeUser(), makeUser(), makeUser()]);
  await db.insert(memberships).values([
    { shopId: manager.shopId, userId: inspector.userId, role: "inspector" },
    { shopId: manager.shopId, userId: member.userId, role: "member" },
  ]);
  ({ id: pressId } = await createPress({ userId: manager.userId }, manager.shopId, { name: "Service test press", frameType: "h-frame", lifecycle: "in-service" }));
});

describe("service plan and log", () => {
  it("offers the starting plan once, then a filter change restarts its task and records the reading", async () => {
    const start = await planPost(jsonRequest(`/api/presses/${pressId}/service-plan`, { startingPlan: true }, await cookie(manager)), params("pressId", pressId));
    expect(start.status).toBe(201);
    const again = await planPost(jsonRequest(`/api/presses/${pressId}/service-plan`, { startingPlan: true }, await cookie(manager)), params("pressId", pressId));
    expect(again.status).toBe(409);
    // Make the filter task overdue: last done 200 days ago at 0 h, then log a change at 40 h today.
    await db.update(serviceTasks).set({ lastDoneOn: addLocalDays(today(), -200) }).where(eq(serviceTasks.kind, "filter-changed"));
    const before = (await (await planGet(getRequest(`/api/presses/${pressId}/service-plan`, await cookie(member)), params("pressId", pressId))).json()) as { tasks: { kind: string; due: { state: string } }[] };
    expect(before.tasks[0]).toMatchObject({ kind: "filter-changed", due: { state: "overdue" } });
    const due = await listServiceDueByPress(db, [pressId], new Date());
    expect(due.get(pressId)?.map((d) => d.state)).toEqual(["overdue"]);

    const res = await logPost(jsonRequest(`/api/presses/${pressId}/service-log`, { kind: "filter-changed", performedOn: today(), hours: 40, parts: [{ description: "Filter element 10 µm", quantity: 1 }], costCents: 2400 }, await cookie(inspector)), params("pressId", pressId));
    expect(res.status).toBe(201);
    const after = (await (await planGet(getRequest(`/api/presses/${pressId}/service-plan`, await cookie(member)), params("pressId", pressId))).json()) as { tasks: { kind: string; lastDoneHours: number; due: { state: string } }[] };
    expect(after.tasks.find((t) => t.kind === "filter-changed")).toMatchObject({ lastDoneHours: 40, due: { state: "ok" } });
    expect((await listServiceDueByPress(db, [pressId], new Date())).has(pressId)).toBe(false);
    const readings = await db.select().from(hourMeterReadings).where(eq(hourMeterReadings.pressId, pressId));
    expect(readings.map((r) => r.hours)).toEqual([40]);
  });

  it("refuses bad input with the field named, and saves nothing", async () => {
    const c = await cookie(manager);
    const post = (body: unknown) => logPost(jsonRequest(`/api/presses/${pressId}/service-log`, body, c), params("pressId", pressId));
    const cases: [unknown, number, string][] = [
      [{ kind: "oil-sample", performedOn: today(), iso4406: "16/18/13" }, 400, "iso4406"],
      [{ kind: "filter-changed", performedOn: addLocalDays(today(), 2) }, 400, "performedOn"],
      [{ kind: "filter-changed", performedOn: today(), surprise: 1 }, 400, ""],
      [{ kind: "relief-checked", performedOn: today() }, 400, "reliefFoundBar"],
    ];
    for (const [body, status, field] of cases) {
      const res = await post(body);
      expect(res.status).toBe(status);
      const json = (await res.json()) as { fieldErrors?: Record<string, string[]> };
      if (field) expect(Object.keys(json.fieldErrors ?? {})).toContain(field);
    }
    const lower = await post({ kind: "oil-topped-up", performedOn: today(), hours: 10 });
    expect(lower.status).toBe(409);
    expect(await db.$count(serviceEntries, eq(serviceEntries.pressId, pressId))).toBe(1);
  });

  it("keeps authorization in the data layer: members read but may not log, outsiders get 404", async () => {
    const body = { kind: "leak-fixed", performedOn: today() };
    expect((await logPost(jsonRequest(`/api/presses/${pressId}/service-log`, body, await cookie(member)), params("pressId", pressId))).status).toBe(403);
    expect((await logPost(jsonRequest(`/api/presses/${pressId}/service-log`, body, await cookie(outsider)), params("pressId", pressId))).status).toBe(404);
    expect((await logGet(getRequest(`/api/presses/${pressId}/service-log`, await cookie(outsider)), params("pressId", pressId))).status).toBe(404);
    expect((await logGet(getRequest(`/api/presses/${pressId}/service-log`, await cookie(member)), params("pressId", pressId))).status).toBe(200);
    expect((await planPost(jsonRequest(`/api/presses/${pressId}/service-plan`, { title: "x", kind: "other", intervalDays: 5 }, await cookie(inspector)), params("pressId", pressId))).status).toBe(403);
    const dueOutsider = (await (await dueRoute(getRequest("/api/due", await cookie(outsider)), {} as never)).json()) as { items: unknown[] };
    expect(dueOutsider.items).toEqual([]);
  });

  it("records a hose replacement as a component replacement in the same transaction", async () => {
    const actor = { userId: manager.userId };
    const { id: hoseId } = await createComponent(actor, pressId, componentInputSchema.parse({ kind: "hose", label: "Pump to valve", spec: { line: "pressure", insideDiameterMm: 12.7, standard: "SAE 100R2AT", ratedPressureBar: 276, lengthMm: 900 }, installedOn: "2025-01-01" }));
    const { id } = await createServiceEntry({ userId: inspector.userId }, pressId, serviceEntryInputSchema.parse({ kind: "hose-replaced", performedOn: today(), componentId: hoseId, replacementLabel: "Pump to valve (new)" }));
    const [entry] = await db.select().from(serviceEntries).where(eq(serviceEntries.id, id));
    const [old] = await db.select().from(components).where(eq(components.id, hoseId));
    expect(old?.removedOn).toBe(today());
    expect(old?.replacedById).toBe(entry?.installedComponentId);
    const [fresh] = await db.select().from(components).where(eq(components.id, entry!.installedComponentId!));
    expect(fresh).toMatchObject({ label: "Pump to valve (new)", kind: "hose" });
    // A part of another press is refused and nothing is written.
    const other = await createPress(actor, manager.shopId, { name: "Other", frameType: "c-frame" });
    const { id: foreignHose } = await createComponent(actor, other.id, componentInputSchema.parse({ kind: "hose", label: "Elsewhere", spec: { line: "return", insideDiameterMm: 19, standard: "SAE 100R1AT", ratedPressureBar: 20, lengthMm: 500 } }));
    await expect(createServiceEntry(actor, pressId, serviceEntryInputSchema.parse({ kind: "hose-replaced", performedOn: today(), componentId: foreignHose }))).rejects.toThrow();
    const [untouched] = await db.select().from(components).where(eq(components.id, foreignHose));
    expect(untouched?.removedOn).toBeNull();
  });

  it("keeps an audit of corrections and pages the log by keyset", async () => {
    const { entries } = await listServiceEntries({ userId: member.userId }, pressId, { limit: 1 });
    const entryId = entries[0]!.id;
    const res = await entryPatch(jsonRequest(`/api/service-log/${entryId}`, { notes: "Corrected note", costCents: 1999 }, await cookie(manager), "PATCH"), params("entryId", entryId));
    expect(res.status).toBe(200);
    const [rev] = await db.select().from(serviceEntryRevisions).where(eq(serviceEntryRevisions.entryId, entryId));
    expect(rev?.changedBy).toBe(manager.userId);
    expect(rev?.changes.notes?.to).toBe("Corrected note");
    const page1 = await listServiceEntries({ userId: member.userId }, pressId, { limit: 1 });
    const page2 = await listServiceEntries({ userId: member.userId }, pressId, { limit: 1, cursor: page1.nextCursor! });
    expect(page2.entries[0]?.id).not.toBe(page1.entries[0]?.id);
    const csv = await logGet(getRequest(`/api/presses/${pressId}/service-log?format=csv`, await cookie(member)), params("pressId", pressId));
    expect(csv.headers.get("content-type")).toContain("text/csv");
    expect(await csv.text()).toContain("Filter element changed");
  });

  it("attaches photos to an entry of the same press only", async () => {
    const { entries } = await listServiceEntries({ userId: member.userId }, pressId, { limit: 1 });
    const entryId = entries[0]!.id;
    const other = await createPress({ userId: manager.userId }, manager.shopId, { name: "Photo elsewhere", frameType: "h-frame" });
    await expect(authorizePhotoTarget({ userId: member.userId }, { pressId: other.id, serviceEntryId: entryId })).rejects.toThrow("Service entry not found");
    await expect(authorizePhotoTarget({ userId: outsider.userId }, { pressId, serviceEntryId: entryId })).rejects.toThrow("Press not found");
    const target = await authorizePhotoTarget({ userId: member.userId }, { pressId, serviceEntryId: entryId });
    const image = { key: "k", url: "http://127.0.0.1/f/k", width: 800, height: 600, bytes: 1000 };
    await createPhotoRecord({ userId: member.userId }, target, { id: newId(), kind: "leak", caption: "Weep at the fitting", full: image, thumb: { ...image, key: "t" } });
    const shots = await listServiceEntryPhotos({ userId: member.userId }, pressId, entryId);
    expect(shots.map((p) => p.caption)).toEqual(["Weep at the fitting"]);
  });
});
