import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { PATCH as closeRoute } from "@/app/api/problems/[problemId]/route";
import { GET as listRoute, POST as reportRoute } from "@/app/api/presses/[pressId]/problems/route";
import { GET as pressStatusRoute } from "@/app/api/presses/[pressId]/status/route";
import { POST as bookRoute } from "@/app/api/presses/[pressId]/bookings/route";
import { GET as pressListRoute } from "@/app/api/presses/route";
import { GET as publicStatusRoute } from "@/app/api/status/[token]/route";
import { db } from "@/db/client";
import { emailOutbox, memberships, presses, pressTagOuts } from "@/db/schema";
import { bookings } from "@/db/schema/bookings";
import { LastManagerError, changeMemberRole, removeMember } from "@/lib/data/shops";
import { listShopStatuses } from "@/lib/data/press-status";
import { getStatusToken, regenerateStatusToken } from "@/lib/data/status-page";
import { ForbiddenError, NotFoundError } from "@/lib/auth/permissions";
import { newId } from "@/lib/ids";
import { authorizePhotoTarget, createPhotoRecord } from "@/lib/data/photos";
import { listProblems } from "@/lib/data/problems";
import { createServiceEntry } from "@/lib/data/service-log";
import { localDate } from "@/lib/schedule";
import { serviceEntryInputSchema } from "@/lib/validation/service";
import { getRequest, jsonRequest } from "./helpers";
import { cookie, futureSlot, makeSharedShop, params } from "./shop-context";

let shop: Awaited<ReturnType<typeof makeSharedShop>>;
beforeAll(async () => {
  shop = await makeSharedShop();
});

const report = async (u: typeof shop.member, body: unknown) =>
  reportRoute(jsonRequest(`/api/presses/${shop.pressId}/problems`, body, await cookie(u)), params("pressId", shop.pressId));
const close = async (u: typeof shop.member, id: string, body: unknown) => closeRoute(jsonRequest(`/api/problems/${id}`, body, await cookie(u), "PATCH"), params("problemId", id));
const status = async (u: typeof shop.member) =>
  (await (await pressStatusRoute(getRequest(`/api/presses/${shop.pressId}/status`, await cookie(u)), params("pressId", shop.pressId))).json()) as { code: string; reasons: string[] };

describe("problem reports", () => {
  it("a plain report leaves the press ready; a stop-use report tags it out and tells managers and booking holders", async () => {
    expect((await report(shop.member, { description: "Gauge needle sticks at 50 bar", severity: "low" })).status).toBe(201);
    expect((await status(shop.member)).code).toBe("ready");

    expect((await bookRoute(jsonRequest(`/api/presses/${shop.pressId}/bookings`, futureSlot(30), await cookie(shop.member2)), params("pressId", shop.pressId))).status).toBe(201);
    const res = await report(shop.member, { description: "Oil spraying from the return line fitting", severity: "high", stopUse: true });
    expect(res.status).toBe(201);
    const { id } = (await res.json()) as { id: string };
    const s = await status(shop.member2);
    expect(s.code).toBe("tagged-out");
    expect(s.reasons).toEqual(["Stop-use problem reported: Oil spraying from the return line fitting"]);

    const [managerMail] = await db.select().from(emailOutbox).where(and(eq(emailOutbox.kind, "problem-report"), eq(emailOutbox.toAddress, shop.manager.email)));
    expect(managerMail?.textBody).toContain("Test Community Forge");
    expect(managerMail?.textBody).toContain("Oil spraying");
    const [holderMail] = await db.select().from(emailOutbox).where(and(eq(emailOutbox.kind, "tag-out-alert"), eq(emailOutbox.toAddress, shop.member2.email)));
    expect(holderMail?.subject).toContain("Tagged out");

    // Members may not close; outsiders do not see it; a close needs a service entry or a reason.
    expect((await close(shop.member, id, { close: true, reason: "Fixed" })).status).toBe(403);
    expect((await close(shop.outsider, id, { close: true, reason: "Fixed" })).status).toBe(404);
    const empty = await close(shop.inspector, id, { close: true });
    expect(empty.status).toBe(400);
    expect(((await empty.json()) as { fieldErrors: Record<string, string[]> }).fieldErrors).toHaveProperty("reason");

    // The linked entry must exist on this press; a made-up id is a field error, nothing closes.
    const unknownEntry = await close(shop.inspector, id, { close: true, serviceEntryId: newId() });
    expect(unknownEntry.status).toBe(400);
    expect(((await unknownEntry.json()) as { fieldErrors: Record<string, string[]> }).fieldErrors).toHaveProperty("serviceEntryId");
    const { id: serviceEntryId } = await createServiceEntry(
      { userId: shop.inspector.userId },
      shop.pressId,
      serviceEntryInputSchema.parse({ kind: "leak-fixed", performedOn: localDate(new Date(), "UTC"), notes: "New return-line fitting" }),
    );
    expect((await close(shop.inspector, id, { close: true, serviceEntryId })).status).toBe(200);
    expect((await close(shop.inspector, id, { close: true, reason: "again" })).status).toBe(409);
    expect((await status(shop.member)).code).toBe("ready");
    const [tag] = await db.select().from(pressTagOuts).where(eq(pressTagOuts.sourceId, id));
    expect(tag?.clearedBy).toBe(shop.inspector.userId);

    const list = (await (await listRoute(getRequest(`/api/presses/${shop.pressId}/problems`, await cookie(shop.member)), params("pressId", shop.pressId))).json()) as {
      open: { id: string }[];
      closed: { id: string; serviceEntryId: string }[];
    };
    expect(list.open).toHaveLength(1);
    expect(list.closed[0]).toMatchObject({ id, serviceEntryId });
  });

  it("takes photos: a report of this press only, listed with the report", async () => {
    const { id } = (await (await report(shop.member, { description: "Weld crack at the left gusset", severity: "medium" })).json()) as { id: string };
    const actor = { userId: shop.member.userId };
    await expect(authorizePhotoTarget(actor, { pressId: shop.pressId, problemReportId: id })).resolves.toMatchObject({ problemReportId: id });
    const otherPress = newId();
    await db.insert(presses).values({ id: otherPress, shopId: shop.shopId, name: "Other press", frameType: "c-frame", lifecycle: "in-service" });
    await expect(authorizePhotoTarget(actor, { pressId: otherPress, problemReportId: id })).rejects.toBeInstanceOf(NotFoundError);
    await expect(authorizePhotoTarget({ userId: shop.outsider.userId }, { pressId: shop.pressId, problemReportId: id })).rejects.toBeInstanceOf(NotFoundError);

    const file = { key: `k-${newId()}`, url: "http://localhost:4010/f/x", width: 800, height: 600, bytes: 1000 };
    await createPhotoRecord(actor, { pressId: shop.pressId, componentId: null, problemReportId: id }, { id: newId(), kind: "damage", caption: "Crack", full: file, thumb: { ...file, key: `t-${newId()}` } });
    const listed = await listProblems(actor, shop.pressId);
    expect(listed.open.find((p) => p.id === id)?.photos.map((p) => p.caption)).toEqual(["Crack"]);
  });

  it("refuses unknown keys and foreign presses", async () => {
    const bad = await report(shop.member, { description: "x y z", severity: "high", stopUse: true, pressId: "nope" });
    expect(bad.status).toBe(400);
    expect(((await bad.json()) as { fieldErrors: Record<string, string[]> }).fieldErrors).toHaveProperty("pressId");
    expect((await report(shop.outsider, { description: "Not my press", severity: "low" })).status).toBe(404);
  });
});

describe("status page", () => {
  it("makes one token on first use, shows status and free time without personal data, and forgets a replaced token", async () => {
    const token = await getStatusToken({ userId: shop.member.userId }, shop.pressId);
    expect(await getStatusToken({ userId: shop.member2.userId }, shop.pressId)).toBe(token);
    await expect(getStatusToken({ userId: shop.outsider.userId }, shop.pressId)).rejects.toBeInstanceOf(NotFoundError);

    const res = await publicStatusRoute(getRequest(`/api/status/${token}`), params("token", token));
    expect(res.status).toBe(200);
    const body = (await res.json()) as { pressName: string; status: { code: string }; days: { label: string }[] };
    expect(body.pressName).toBe("Test 20 t press");
    expect(body.days.map((d) => d.label)).toEqual(["Today", "Tomorrow"]);
    const text = JSON.stringify(body);
    for (const secret of [shop.member.email, shop.member2.email, shop.pressId, shop.shopId, "Test User"]) expect(text).not.toContain(secret);

    await expect(regenerateStatusToken({ userId: shop.member.userId }, shop.pressId)).rejects.toBeInstanceOf(ForbiddenError);
    const fresh = await regenerateStatusToken({ userId: shop.manager.userId }, shop.pressId);
    expect(fresh).not.toBe(token);
    expect((await publicStatusRoute(getRequest(`/api/status/${token}`), params("token", token))).status).toBe(404);
    expect((await publicStatusRoute(getRequest("/api/status/not-a-token"), params("token", "not-a-token"))).status).toBe(404);
  });

  it("derives every press's status of a shop at once", async () => {
    const building = newId();
    await db.insert(presses).values({ id: building, shopId: shop.shopId, name: "Half-built press", frameType: "four-post", lifecycle: "building" });
    const statuses = await listShopStatuses({ userId: shop.member.userId }, shop.shopId);
    expect(statuses.get(building)?.code).toBe("not-in-service");
    expect(statuses.get(shop.pressId)?.code).toBe("ready");
    expect((await listShopStatuses({ userId: shop.outsider.userId }, shop.shopId)).size).toBe(0);
    const listed = await pressListRoute(getRequest(`/api/presses?shopId=${shop.shopId}`, await cookie(shop.member)), {} as never);
    const body = (await listed.json()) as { presses: { id: string; status: { code: string; label: string } }[] };
    expect(body.presses.find((p) => p.id === building)?.status).toMatchObject({ code: "not-in-service", label: "Not in service" });
  });
});

describe("shop members", () => {
  it("removes a member with their future bookings, and never the last manager", async () => {
    const slot = futureSlot(60);
    expect((await bookRoute(jsonRequest(`/api/presses/${shop.pressId}/bookings`, slot, await cookie(shop.member2)), params("pressId", shop.pressId))).status).toBe(201);
    await expect(removeMember({ userId: shop.member.userId }, shop.shopId, shop.member2.userId)).rejects.toBeInstanceOf(ForbiddenError);
    await removeMember({ userId: shop.manager.userId }, shop.shopId, shop.member2.userId);
    expect(await db.select().from(memberships).where(and(eq(memberships.shopId, shop.shopId), eq(memberships.userId, shop.member2.userId)))).toHaveLength(0);
    expect(await db.select().from(bookings).where(and(eq(bookings.userId, shop.member2.userId), eq(bookings.pressId, shop.pressId)))).toHaveLength(0); // both of their bookings were still to come
    await expect(removeMember({ userId: shop.manager.userId }, shop.shopId, shop.manager.userId)).rejects.toBeInstanceOf(LastManagerError);
    await expect(changeMemberRole({ userId: shop.manager.userId }, shop.shopId, shop.manager.userId, "member")).rejects.toBeInstanceOf(LastManagerError);
  });
});
