import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { PATCH as patchComponentRoute } from "@/app/api/components/[componentId]/route";
import { POST as replaceRoute } from "@/app/api/components/[componentId]/replace/route";
import { POST as createComponentRoute } from "@/app/api/presses/[pressId]/components/route";
import { GET as exportRoute } from "@/app/api/presses/[pressId]/export/route";
import { POST as hourMeterRoute } from "@/app/api/presses/[pressId]/hour-meter/route";
import { PATCH as patchPressRoute } from "@/app/api/presses/[pressId]/route";
import { POST as createPressRoute } from "@/app/api/presses/route";
import { db } from "@/db/client";
import { components, memberships, presses } from "@/db/schema";
import { ForbiddenError, NotFoundError } from "@/lib/auth/permissions";
import { createSession } from "@/lib/auth/session";
import { createComponent, deleteComponent, listComponents, replaceComponent } from "@/lib/data/components";
import { createPress, listHourReadings, recordHourMeter, updatePress } from "@/lib/data/press-edits";
import { ConflictError } from "@/lib/errors";
import { evaluateAsBuilt } from "@/lib/press/as-built";
import { componentInputSchema, type ComponentInput } from "@/lib/validation/press";
import { getRequest, jsonRequest, makeUser } from "./helpers";

type U = Awaited<ReturnType<typeof makeUser>>;
let manager: U;
let member: U;
let outsider: U;
const cookie = async (u: U) => ({ cookie: `session=${(await createSession(u.userId)).token}` });
const params = <K extends string>(key: K, value: string) => ({ params: Promise.resolve({ [key]: value } as Record<K, string>) });

const hose = (ratedPressureBar: number, label = "Pressure hose"): ComponentInput =>
  componentInputSchema.parse({ kind: "hose", label, spec: { line: "pressure", insideDiameterMm: 12.7, standard: "SAE 100R2AT", ratedPressureBar, lengthMm: 1000 }, installedOn: "2026-01-10" });

beforeAll(async () => {
  [manager, member, outsider] = await Promise.all([makeUser(), makeUser(), makeUser()]);
  await db.insert(memberships).values({ shopId: manager.shopId, userId: member.userId, role: "member" });
});

describe("presses", () => {
  it("are created and edited by managers only, with strict SI bodies", async () => {
    const res = await createPressRoute(jsonRequest("/api/presses", { name: "Test press", frameType: "h-frame", reliefPressureBar: 200 }, await cookie(manager)), {} as never);
    expect(res.status).toBe(201);
    const { id } = (await res.json()) as { id: string };

    const byMember = await createPressRoute(jsonRequest("/api/presses", { shopId: manager.shopId, name: "Nope", frameType: "h-frame" }, await cookie(member)), {} as never);
    expect(byMember.status).toBe(403);
    const massAssign = await createPressRoute(jsonRequest("/api/presses", { name: "X", frameType: "h-frame", hourMeter: 9999 }, await cookie(manager)), {} as never);
    expect(massAssign.status).toBe(400);

    const edit = await patchPressRoute(jsonRequest(`/api/presses/${id}`, { strokeMm: 250 }, await cookie(manager), "PATCH"), params("pressId", id));
    expect(edit.status).toBe(200);
    expect(((await edit.json()) as { press: { strokeMm: number } }).press.strokeMm).toBe(250);
    const memberEdit = await patchPressRoute(jsonRequest(`/api/presses/${id}`, { strokeMm: 1 }, await cookie(member), "PATCH"), params("pressId", id));
    expect(memberEdit.status).toBe(403);
    const foreign = await patchPressRoute(jsonRequest(`/api/presses/${id}`, { strokeMm: 1 }, await cookie(outsider), "PATCH"), params("pressId", id));
    expect(foreign.status).toBe(404);
    const bad = await patchPressRoute(jsonRequest(`/api/presses/${id}`, { strokeMm: -5 }, await cookie(manager), "PATCH"), params("pressId", id));
    expect(bad.status).toBe(400);
  });

  it("refuses every edit once retired", async () => {
    const { id } = await createPress({ userId: manager.userId }, manager.shopId, { name: "Retiree", frameType: "c-frame", lifecycle: "in-service" });
    await updatePress({ userId: manager.userId }, id, { lifecycle: "retired" });
    await expect(updatePress({ userId: manager.userId }, id, { name: "Back again" })).rejects.toBeInstanceOf(ConflictError);
    await expect(createComponent({ userId: manager.userId }, id, hose(250))).rejects.toBeInstanceOf(ConflictError);
    const [row] = await db.select({ name: presses.name }).from(presses).where(eq(presses.id, id));
    expect(row!.name).toBe("Retiree");
  });
});

describe("components and their history", () => {
  it("replaces a part in one transaction, keeping the old one linked to its successor", async () => {
    const actor = { userId: manager.userId };
    const { id: pressId } = await createPress(actor, manager.shopId, { name: "History press", frameType: "h-frame", lifecycle: "in-service" });
    const { id: oldId } = await createComponent(actor, pressId, hose(160, "Hose A"));
    const { id: newId } = await replaceComponent(actor, oldId, { reason: "Rated below relief", removedOn: "2026-02-01", replacement: hose(276, "Hose A") });

    const installed = await listComponents(actor, pressId);
    expect(installed.map((c) => c.id)).toEqual([newId]);
    const all = await listComponents(actor, pressId, { includeRemoved: true });
    expect(all.find((c) => c.id === oldId)).toMatchObject({ removedOn: "2026-02-01", removalReason: "Rated below relief", replacedById: newId });
    expect(all.find((c) => c.id === newId)).toMatchObject({ installedOn: "2026-01-10", removedOn: null });

    await expect(replaceComponent(actor, oldId, { reason: "again", removedOn: "2026-03-01", replacement: hose(300) })).rejects.toBeInstanceOf(ConflictError);
    await expect(deleteComponent(actor, oldId)).rejects.toBeInstanceOf(ConflictError);
    await expect(deleteComponent(actor, newId)).rejects.toBeInstanceOf(ConflictError);
  });

  it("leaves nothing half-saved when a replacement is refused", async () => {
    const actor = { userId: manager.userId };
    const { id: pressId } = await createPress(actor, manager.shopId, { name: "Atomic press", frameType: "h-frame" });
    const { id: hoseId } = await createComponent(actor, pressId, hose(200));
    const gauge = componentInputSchema.parse({ kind: "gauge", label: "Gauge", spec: { rangeBar: 250 } });
    await expect(replaceComponent(actor, hoseId, { reason: "wrong kind", removedOn: "2026-02-01", replacement: gauge })).rejects.toBeInstanceOf(ConflictError);
    await expect(replaceComponent(actor, hoseId, { reason: "too early", removedOn: "2025-01-01", replacement: hose(300) })).rejects.toBeInstanceOf(ConflictError);
    const rows = await db.select().from(components).where(eq(components.pressId, pressId));
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ id: hoseId, removedOn: null, replacedById: null });
  });

  it("validates each kind's spec and refuses impossible dimensions with field paths", async () => {
    const pressId = (await createPress({ userId: manager.userId }, manager.shopId, { name: "Spec press", frameType: "h-frame" })).id;
    const bad = await createComponentRoute(
      jsonRequest(`/api/presses/${pressId}/components`, { kind: "cylinder", label: "Cyl", spec: { boreMm: 100, rodMm: 120, strokeMm: 200, ratedPressureBar: 250, endFixity: "fixed-fixed" } }, await cookie(manager)),
      params("pressId", pressId),
    );
    expect(bad.status).toBe(400);
    // Field errors name the full path of the field, as the forms do.
    expect(((await bad.json()) as { fieldErrors: Record<string, string[]> }).fieldErrors).toHaveProperty(["spec.rodMm"]);
    const negative = componentInputSchema.safeParse({ kind: "hose", label: "H", spec: { line: "pressure", insideDiameterMm: -1, standard: "x", ratedPressureBar: 200, lengthMm: 100 } });
    expect(negative.success).toBe(false);
    expect(negative.error!.issues[0]!.path).toEqual(["spec", "insideDiameterMm"]);

    const ok = await createComponentRoute(jsonRequest(`/api/presses/${pressId}/components`, { kind: "gauge", label: "Gauge", spec: { rangeBar: 250 } }, await cookie(manager)), params("pressId", pressId));
    expect(ok.status).toBe(201);
    const { id } = (await ok.json()) as { id: string };
    const byMember = await patchComponentRoute(jsonRequest(`/api/components/${id}`, { label: "Mine now" }, await cookie(member), "PATCH"), params("componentId", id));
    expect(byMember.status).toBe(403);
    const foreign = await patchComponentRoute(jsonRequest(`/api/components/${id}`, { label: "Mine now" }, await cookie(outsider), "PATCH"), params("componentId", id));
    expect(foreign.status).toBe(404);
    const replaced = await replaceRoute(jsonRequest(`/api/components/${id}/replace`, { reason: "Upgrade", removedOn: "2026-05-01", replacement: { kind: "gauge", label: "Gauge", spec: { rangeBar: 400 } } }, await cookie(manager)), params("componentId", id));
    expect(replaced.status).toBe(201);
  });

  it("fails the as-built check on a hose rated below relief and passes once it is replaced", async () => {
    const actor = { userId: manager.userId };
    const { id: pressId } = await createPress(actor, manager.shopId, { name: "As-built press", frameType: "h-frame", workingPressureBar: 180 });
    const add = (input: unknown) => createComponent(actor, pressId, componentInputSchema.parse(input));
    await add({ kind: "cylinder", label: "Cylinder", spec: { boreMm: 127, rodMm: 63.5, strokeMm: 200, ratedPressureBar: 250, endFixity: "fixed-pinned" } });
    await add({ kind: "pump", label: "Pump", spec: { pumpKind: "single", flowLpm: 8, ratedPressureBar: 250 } });
    await add({ kind: "motor", label: "Motor", spec: { powerKw: 4, supply: "single-phase" } });
    await add({ kind: "relief-valve", label: "Relief", spec: { settingBar: 200 } });
    const { id: weak } = await createComponent(actor, pressId, hose(160, "Weak hose"));

    const before = evaluateAsBuilt({ workingPressureBar: 180, reliefPressureBar: null }, await listComponents(actor, pressId), "metric");
    expect(before.ready).toBe(true);
    expect(before.checks.find((c) => c.id === "rating-hose")).toMatchObject({ level: "fail", message: expect.stringContaining("Weak hose") });

    await replaceComponent(actor, weak, { reason: "Below relief", removedOn: "2026-02-01", replacement: hose(276, "Strong hose") });
    const after = evaluateAsBuilt({ workingPressureBar: 180, reliefPressureBar: null }, await listComponents(actor, pressId), "metric");
    expect(after.checks.find((c) => c.id === "rating-hose")?.level).toBe("ok");
    expect(after.checks.some((c) => c.level === "fail")).toBe(false);
  });
});

describe("hour meter", () => {
  it("never goes backwards, and any member may record it", async () => {
    const { id: pressId } = await createPress({ userId: manager.userId }, manager.shopId, { name: "Hours press", frameType: "h-frame", lifecycle: "in-service" });
    // Readings a day apart, so the elapsed-time rule (tested in hour-meter-hardening) allows them.
    const daysAgo = (d: number) => new Date(Date.now() - d * 86_400_000);
    await recordHourMeter({ userId: manager.userId }, pressId, { hours: 10 }, daysAgo(3));
    await recordHourMeter({ userId: member.userId }, pressId, { hours: 12.5 }, daysAgo(2));
    await expect(recordHourMeter({ userId: manager.userId }, pressId, { hours: 12 })).rejects.toThrow(/cannot go backwards/);
    await expect(recordHourMeter({ userId: outsider.userId }, pressId, { hours: 20 })).rejects.toBeInstanceOf(NotFoundError);

    const backwards = await hourMeterRoute(jsonRequest(`/api/presses/${pressId}/hour-meter`, { hours: 1 }, await cookie(member)), params("pressId", pressId));
    expect(backwards.status).toBe(409);
    expect(((await backwards.json()) as { error: string }).error).toMatch(/12.5 h/);

    // Two readings at once: the row lock lets both through only in order.
    await Promise.all([recordHourMeter({ userId: manager.userId }, pressId, { hours: 20 }), recordHourMeter({ userId: manager.userId }, pressId, { hours: 21 })].map((p) => p.catch(() => "refused")));
    const readings = (await listHourReadings({ userId: manager.userId }, pressId)).map((r) => r.hours);
    for (let i = 1; i < readings.length; i++) expect(readings[i - 1]!).toBeGreaterThanOrEqual(readings[i]!);
    const [row] = await db.select({ hours: presses.hourMeter }).from(presses).where(eq(presses.id, pressId));
    expect(row!.hours).toBe(readings[0]);
  });
});

describe("exports", () => {
  it("exports the parts list with totals, and guards against spreadsheet formulas", async () => {
    const actor = { userId: manager.userId };
    const { id: pressId } = await createPress(actor, manager.shopId, { name: "CSV press", frameType: "h-frame" });
    await createComponent(actor, pressId, { ...hose(250, "=HYPERLINK(1)"), costCents: 1250, purchased: false });
    await createComponent(actor, pressId, componentInputSchema.parse({ kind: "gauge", label: "Gauge", spec: { rangeBar: 250 }, costCents: 2000, purchased: true }));
    const res = await exportRoute(getRequest(`/api/presses/${pressId}/export?what=parts`, await cookie(manager)), params("pressId", pressId));
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/text\/csv/);
    const csv = await res.text();
    expect(csv).toContain("'=HYPERLINK(1)");
    expect(csv).toMatch(/total,,,,,32\.50/);
    expect(csv).toMatch(/still to buy,,,,,12\.50,1/);
    const foreign = await exportRoute(getRequest(`/api/presses/${pressId}/export?what=parts`, await cookie(outsider)), params("pressId", pressId));
    expect(foreign.status).toBe(404);
  });
});

describe("data-layer guards", () => {
  it("refuses members and outsiders", async () => {
    const { id: pressId } = await createPress({ userId: manager.userId }, manager.shopId, { name: "Guarded", frameType: "h-frame" });
    await expect(createComponent({ userId: member.userId }, pressId, hose(250))).rejects.toBeInstanceOf(ForbiddenError);
    await expect(createComponent({ userId: outsider.userId }, pressId, hose(250))).rejects.toBeInstanceOf(NotFoundError);
    await expect(createPress({ userId: member.userId }, manager.shopId, { name: "x", frameType: "h-frame", lifecycle: "planned" })).rejects.toBeInstanceOf(ForbiddenError);
    await expect(listComponents({ userId: outsider.userId }, pressId)).rejects.toBeInstanceOf(NotFoundError);
  });
});
