import { and, eq } from "drizzle-orm";
import mysql from "mysql2/promise";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { PATCH as patchRoute } from "@/app/api/inspections/[inspectionId]/route";
import { POST as signRoute } from "@/app/api/inspections/[inspectionId]/sign/route";
import { GET as verifyRoute } from "@/app/api/presses/[pressId]/inspections/verify/route";
import { POST as startRoute } from "@/app/api/presses/[pressId]/inspections/route";
import { db } from "@/db/client";
import { migrationDatabaseUrl } from "@/db/config";
import { emailOutbox, inspectionAnswerOps, inspectionAnswers, inspections, memberships, photos, presses, shops } from "@/db/schema";
import { createSession } from "@/lib/auth/session";
import { ReauthRequiredError } from "@/lib/auth/recent-sign-in";
import { POST as tagOutRoute } from "@/app/api/presses/[pressId]/tag-outs/route";
import { POST as clearRoute } from "@/app/api/tag-outs/[tagOutId]/clear/route";
import { PUT as putTemplateRoute } from "@/app/api/inspection-templates/[templateId]/route";
import { getTemplate, listTemplates } from "@/lib/data/inspection-templates";
import { authorizePhotoTarget, deletePhoto } from "@/lib/data/photos";
import { ConflictError } from "@/lib/errors";
import { signInspection, verifyPressChain } from "@/lib/data/inspection-sign";
import { getInspection, updateAnswers } from "@/lib/data/inspections";
import { listOpenTagOuts } from "@/lib/data/tag-outs";
import { newId } from "@/lib/ids";
import { getRequest, jsonRequest, makeUser } from "./helpers";

type U = Awaited<ReturnType<typeof makeUser>>;
let manager: U;
let inspector: U;
let member: U;
let outsider: U;
let pressId: string;
let monthlyId: string;
let migrate: mysql.Connection;

const cookie = async (u: U) => ({ cookie: `session=${(await createSession(u.userId)).token}` });
const params = <K extends string>(key: K, value: string) => ({ params: Promise.resolve({ [key]: value } as Record<K, string>) });
const fresh = (u: U) => ({ userId: u.userId, signedInAt: new Date() });
const op = () => crypto.randomUUID();

/** The database's own message for a refused statement (Drizzle wraps it as the cause). */
async function sqlError(statement: Promise<unknown>): Promise<string> {
  try {
    await statement;
    return "no error";
  } catch (error) {
    return String((error as { cause?: { message?: string } }).cause?.message ?? (error as Error).message);
  }
}

async function start(u: U, templateId = monthlyId): Promise<Response> {
  return startRoute(jsonRequest(`/api/presses/${pressId}/inspections`, { templateId }, await cookie(u)), params("pressId", pressId));
}

/** Answers every item pass, except the ones given. */
async function answerAll(u: U, inspectionId: string, except: Record<string, { outcome: "fail" | "na"; note?: string }> = {}): Promise<void> {
  const view = await getInspection({ userId: u.userId }, inspectionId);
  await updateAnswers({ userId: u.userId }, inspectionId, {
    answers: view.items.map((i) => ({ opKey: op(), itemKey: i.key, outcome: except[i.key]?.outcome ?? "pass", note: except[i.key]?.note ?? null })),
  });
}

beforeAll(async () => {
  [manager, inspector, member, outsider] = await Promise.all([makeUser(), makeUser(), makeUser(), makeUser()]);
  await db.insert(memberships).values([
    { shopId: manager.shopId, userId: inspector.userId, role: "inspector" },
    { shopId: manager.shopId, userId: member.userId, role: "member" },
  ]);
  await db.update(shops).set({ name: "Anvil Row Test Forge" }).where(eq(shops.id, manager.shopId));
  pressId = newId();
  await db.insert(presses).values({ id: pressId, shopId: manager.shopId, name: "Chain test press", frameType: "h-frame", lifecycle: "in-service" });
  const templates = await listTemplates({ userId: member.userId }, manager.shopId);
  monthlyId = templates.find((t) => t.cadence === "monthly")!.id;
  migrate = await mysql.createConnection({ uri: migrationDatabaseUrl(), timezone: "Z" });
});

afterAll(async () => {
  await migrate.end();
});

describe("inspections", () => {
  it("gives a shop its default checklists once, with who may sign by cadence", async () => {
    const again = await listTemplates({ userId: manager.userId }, manager.shopId);
    expect(again.map((t) => t.cadence).sort()).toEqual(["after-modification", "monthly", "pre-use", "weekly", "yearly"]);
    expect(again.find((t) => t.cadence === "pre-use")?.signerRole).toBe("member");
    expect(again.filter((t) => t.cadence !== "pre-use").every((t) => t.signerRole === "inspector")).toBe(true);
    await expect(listTemplates({ userId: outsider.userId }, manager.shopId)).rejects.toThrow("Shop not found");
  });

  it("a member can neither start nor sign a monthly inspection", async () => {
    expect((await start(member)).status).toBe(403);
    const res = await start(inspector);
    expect(res.status).toBe(201);
    const { id } = (await res.json()) as { id: string };
    await answerAll(inspector, id);
    const bySign = await signRoute(jsonRequest(`/api/inspections/${id}/sign`, {}, await cookie(member)), params("inspectionId", id));
    expect(bySign.status).toBe(403);
    expect((await start(outsider)).status).toBe(404);
    const [row] = await db.select({ signedAt: inspections.signedAt }).from(inspections).where(eq(inspections.id, id));
    expect(row?.signedAt).toBeNull();
  });

  it("refuses a failure without a note and answers for items not in the snapshot, changing nothing", async () => {
    const { id } = (await (await start(inspector)).json()) as { id: string };
    const auth = await cookie(inspector);
    const noNote = await patchRoute(jsonRequest(`/api/inspections/${id}`, { answers: [{ opKey: op(), itemKey: "welds", outcome: "fail" }] }, auth, "PATCH"), params("inspectionId", id));
    expect(noNote.status).toBe(400);
    expect(((await noNote.json()) as { fieldErrors: Record<string, string[]> }).fieldErrors["answers.0.note"]?.[0]).toContain("needs a note");
    const unknown = await patchRoute(
      jsonRequest(`/api/inspections/${id}`, { answers: [{ opKey: op(), itemKey: "welds", outcome: "pass" }, { opKey: op(), itemKey: "paint-colour", outcome: "pass" }] }, auth, "PATCH"),
      params("inspectionId", id),
    );
    expect(unknown.status).toBe(400);
    expect(Object.keys(((await unknown.json()) as { fieldErrors: Record<string, string[]> }).fieldErrors)).toContain("answers.1.itemKey");
    const extraKey = await patchRoute(jsonRequest(`/api/inspections/${id}`, { answers: [{ opKey: op(), itemKey: "welds", outcome: "pass" }], signedBy: "me" }, auth, "PATCH"), params("inspectionId", id));
    expect(Object.keys(((await extraKey.json()) as { fieldErrors: Record<string, string[]> }).fieldErrors)).toContain("signedBy");
    const answered = await db.select().from(inspectionAnswers).where(and(eq(inspectionAnswers.inspectionId, id), eq(inspectionAnswers.itemKey, "welds")));
    expect(answered[0]?.outcome).toBeNull();
  });

  it("applies a resent change once (idempotency key)", async () => {
    const { id } = (await (await start(inspector)).json()) as { id: string };
    const change = { opKey: op(), itemKey: "bolts", outcome: "na" as const, note: null };
    const first = await updateAnswers({ userId: inspector.userId }, id, { answers: [change] });
    const second = await updateAnswers({ userId: inspector.userId }, id, { answers: [change, { ...change, opKey: op(), outcome: "pass" }] });
    expect([first.applied, second.applied, second.duplicates]).toEqual([1, 1, 1]);
    expect(await db.select().from(inspectionAnswerOps).where(eq(inspectionAnswerOps.opKey, change.opKey))).toHaveLength(1);
    expect(second.items.find((i) => i.itemKey === "bolts")?.outcome).toBe("pass");
  });

  it("a failed critical item tags the press out and queues an alert to the managers; a signed record never changes", async () => {
    const { id } = (await (await start(inspector)).json()) as { id: string };
    await answerAll(inspector, id, { bolts: { outcome: "fail", note: "Two tie-rod nuts turned by hand" } });
    await expect(signInspection({ userId: inspector.userId, signedInAt: new Date(Date.now() - 60 * 60 * 1000) }, id)).rejects.toBeInstanceOf(ReauthRequiredError);

    const res = await signRoute(jsonRequest(`/api/inspections/${id}/sign`, undefined, await cookie(inspector)), params("inspectionId", id));
    expect(res.status).toBe(200);
    const signed = (await res.json()) as { result: string; taggedOut: boolean; chainSeq: number };
    expect(signed).toMatchObject({ result: "fail", taggedOut: true });
    const open = (await listOpenTagOuts(db, [pressId])).get(pressId) ?? [];
    expect(open.map((t) => [t.source, t.sourceId])).toContainEqual(["inspection", id]);
    expect(open.find((t) => t.sourceId === id)?.reason).toContain("Bolts and tie-rod nuts tight");
    const mail = await db.select().from(emailOutbox).where(eq(emailOutbox.dedupeKey, `tag-out-alert:${id}:${manager.userId}`));
    expect(mail).toHaveLength(1);
    expect(mail[0]).toMatchObject({ kind: "tag-out-alert", toAddress: manager.email, shopId: manager.shopId });
    expect(mail[0]?.textBody).toContain("Anvil Row Test Forge");
    expect(mail[0]?.htmlBody).toContain("Two tie-rod nuts turned by hand");

    // Through the app: 409 for editing and for signing again.
    const edit = await patchRoute(jsonRequest(`/api/inspections/${id}`, { answers: [{ opKey: op(), itemKey: "bolts", outcome: "pass" }] }, await cookie(inspector), "PATCH"), params("inspectionId", id));
    expect(edit.status).toBe(409);
    const twice = await signRoute(jsonRequest(`/api/inspections/${id}/sign`, {}, await cookie(inspector)), params("inspectionId", id));
    expect(twice.status).toBe(409);
    // Behind the app's back: the triggers refuse, even for the app's own database user.
    expect(await sqlError(db.update(inspections).set({ signerName: "Someone else" }).where(eq(inspections.id, id)))).toMatch(/signed inspections are read-only/);
    expect(await sqlError(db.update(inspectionAnswers).set({ outcome: "pass" }).where(eq(inspectionAnswers.inspectionId, id)))).toMatch(/signed inspections are read-only/);
    expect(await sqlError(db.delete(inspections).where(eq(inspections.id, id)))).toMatch(/signed inspections are read-only/);
    const [still] = await db.select({ result: inspections.result }).from(inspections).where(eq(inspections.id, id));
    expect(still?.result).toBe("fail");
  });

  it("a passing re-inspection clears the inspection tag-out; the verifier names exactly the record whose byte changed", async () => {
    const { id } = (await (await start(inspector)).json()) as { id: string };
    await answerAll(inspector, id, { "die-holders": { outcome: "na" } });
    const outcome = await signInspection(fresh(inspector), id);
    expect(outcome.result).toBe("pass");
    expect(outcome.clearedTagOuts).toBe(1);
    expect((await listOpenTagOuts(db, [pressId])).get(pressId)).toBeUndefined();

    const intact = await verifyRoute(getRequest(`/api/presses/${pressId}/inspections/verify`, await cookie(member)), params("pressId", pressId));
    expect(await intact.json()).toMatchObject({ intact: true, checked: 2, broken: [] });

    const [first] = await db.select({ id: inspections.id, signerName: inspections.signerName }).from(inspections).where(and(eq(inspections.pressId, pressId), eq(inspections.chainSeq, 1)));
    await migrate.query("DROP TRIGGER inspections_signed_no_update");
    try {
      // One byte: the first letter of the signer's name.
      await migrate.query("UPDATE inspections SET signer_name = CONCAT('X', SUBSTRING(signer_name, 2)) WHERE id = ?", [first!.id]);
    } finally {
      await migrate.query(`CREATE TRIGGER inspections_signed_no_update BEFORE UPDATE ON inspections FOR EACH ROW
        BEGIN IF OLD.signed_at IS NOT NULL THEN SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'signed inspections are read-only'; END IF; END`);
    }
    const report = await verifyPressChain({ userId: member.userId }, pressId);
    expect(report.intact).toBe(false);
    expect(report.checked).toBe(2);
    expect(report.broken).toEqual([{ id: first!.id, chainSeq: 1, reason: "content" }]);
    await expect(verifyPressChain({ userId: outsider.userId }, pressId)).rejects.toThrow("Press not found");
  });

  it("another shop's user cannot answer (404)", async () => {
    const { id } = (await (await start(inspector)).json()) as { id: string };
    const foreign = await patchRoute(jsonRequest(`/api/inspections/${id}`, { answers: [{ opKey: op(), itemKey: "bolts", outcome: "pass" }] }, await cookie(outsider), "PATCH"), params("inspectionId", id));
    expect(foreign.status).toBe(404);
  });

  it("photos attach to an item of an open inspection on the same press only", async () => {
    const { id } = (await (await start(inspector)).json()) as { id: string };
    const view = await getInspection({ userId: inspector.userId }, id);
    const answerId = view.items[0]!.answerId;
    expect(await authorizePhotoTarget({ userId: inspector.userId }, { pressId, inspectionItemId: answerId })).toMatchObject({ inspectionItemId: answerId });
    const otherPress = newId();
    await db.insert(presses).values({ id: otherPress, shopId: manager.shopId, name: "Other press", frameType: "c-frame" });
    await expect(authorizePhotoTarget({ userId: inspector.userId }, { pressId: otherPress, inspectionItemId: answerId })).rejects.toThrow("Inspection item not found");
    const [signed] = await db.select({ id: inspections.id }).from(inspections).where(and(eq(inspections.pressId, pressId), eq(inspections.chainSeq, 2)));
    const signedItem = (await getInspection({ userId: inspector.userId }, signed!.id)).items[0]!.answerId;
    await expect(authorizePhotoTarget({ userId: inspector.userId }, { pressId, inspectionItemId: signedItem })).rejects.toBeInstanceOf(ConflictError);
  });

  it("editing a checklist changes new runs only; members may not edit it", async () => {
    const { id: before } = (await (await start(inspector)).json()) as { id: string };
    const template = await getTemplate({ userId: manager.userId }, monthlyId);
    const items = [...template.items.map(({ key, area, text, guidance, critical, photoOnFail, lockout }) => ({ key, area, text, guidance, critical, photoOnFail, lockout })), { area: "electrical" as const, text: "Emergency stop button latches", critical: true }];
    const byMember = await putTemplateRoute(jsonRequest(`/api/inspection-templates/${monthlyId}`, { name: template.name, cadence: "monthly", items }, await cookie(member), "PUT"), params("templateId", monthlyId));
    expect(byMember.status).toBe(403);
    const ok = await putTemplateRoute(jsonRequest(`/api/inspection-templates/${monthlyId}`, { name: "Monthly inspection v2", cadence: "monthly", items }, await cookie(manager), "PUT"), params("templateId", monthlyId));
    expect(ok.status).toBe(200);
    const { id: after } = (await (await start(inspector)).json()) as { id: string };
    const [old, fresh] = await Promise.all([getInspection({ userId: member.userId }, before), getInspection({ userId: member.userId }, after)]);
    expect(old.templateName).toBe("Monthly inspection");
    expect(old.items).toHaveLength(template.items.length);
    expect(fresh.templateName).toBe("Monthly inspection v2");
    expect(fresh.items.at(-1)).toMatchObject({ key: "item-1", text: "Emergency stop button latches", critical: true });
  });

  it("managers and inspectors tag out by hand and clear with a recorded reason; members may not", async () => {
    const byMember = await tagOutRoute(jsonRequest(`/api/presses/${pressId}/tag-outs`, { reason: "Looks wrong" }, await cookie(member)), params("pressId", pressId));
    expect(byMember.status).toBe(403);
    const empty = await tagOutRoute(jsonRequest(`/api/presses/${pressId}/tag-outs`, { reason: "  " }, await cookie(inspector)), params("pressId", pressId));
    expect(empty.status).toBe(400);
    const res = await tagOutRoute(jsonRequest(`/api/presses/${pressId}/tag-outs`, { reason: "Pump being rebuilt" }, await cookie(inspector)), params("pressId", pressId));
    expect(res.status).toBe(201);
    const { id } = (await res.json()) as { id: string };
    const clearByMember = await clearRoute(jsonRequest(`/api/tag-outs/${id}/clear`, { reason: "Fine now" }, await cookie(member)), params("tagOutId", id));
    expect(clearByMember.status).toBe(403);
    const clearByOutsider = await clearRoute(jsonRequest(`/api/tag-outs/${id}/clear`, { reason: "Fine now" }, await cookie(outsider)), params("tagOutId", id));
    expect(clearByOutsider.status).toBe(404);
    const cleared = await clearRoute(jsonRequest(`/api/tag-outs/${id}/clear`, { reason: "Pump rebuilt and run to pressure" }, await cookie(manager)), params("tagOutId", id));
    expect(cleared.status).toBe(200);
    expect((await listOpenTagOuts(db, [pressId])).get(pressId)).toBeUndefined();
    const again = await clearRoute(jsonRequest(`/api/tag-outs/${id}/clear`, { reason: "Twice" }, await cookie(manager)), params("tagOutId", id));
    expect(again.status).toBe(404);
  });

  it("a photo of a signed inspection can no longer be deleted", async () => {
    const { id } = (await (await start(inspector)).json()) as { id: string };
    const view = await getInspection({ userId: inspector.userId }, id);
    const photoId = newId();
    const file = { key: `k-${photoId}`, url: "http://localhost:4010/f/x.jpg" };
    await db.insert(photos).values({
      id: photoId, pressId, inspectionItemId: view.items[0]!.answerId, uploadedBy: inspector.userId, fileKey: file.key, fileUrl: file.url, width: 10, height: 10, bytes: 100,
      thumbKey: `${file.key}-t`, thumbUrl: file.url, thumbWidth: 5, thumbHeight: 5, thumbBytes: 50,
    });
    await answerAll(inspector, id);
    await signInspection(fresh(inspector), id);
    await expect(deletePhoto({ userId: inspector.userId }, photoId)).rejects.toBeInstanceOf(ConflictError);
    expect(await db.select({ id: photos.id }).from(photos).where(eq(photos.id, photoId))).toHaveLength(1);
  });
});
