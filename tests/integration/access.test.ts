import { count, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { GET as getPressRoute } from "@/app/api/presses/[pressId]/route";
import { GET as listPressesRoute } from "@/app/api/presses/route";
import { db } from "@/db/client";
import { auditLog, memberships, presses, shops } from "@/db/schema";
import { createSession } from "@/lib/auth/session";
import { ForbiddenError, NotFoundError } from "@/lib/auth/permissions";
import { newId } from "@/lib/ids";
import { getPress, listPresses } from "@/lib/data/presses";
import { changeMemberRole, LastManagerError, listMembers, switchActiveShop, updateShop } from "@/lib/data/shops";
import { createUserWithPersonalShop, EmailTakenError } from "@/lib/data/users";
import { getRequest, makeUser } from "./helpers";

type U = Awaited<ReturnType<typeof makeUser>>;
let alice: U; // manager of shop A
let member: U; // member of shop A
let bob: U; // manager of shop B only
let pressA: string;

beforeAll(async () => {
  [alice, member, bob] = await Promise.all([makeUser(), makeUser(), makeUser()]);
  await db.insert(memberships).values({ shopId: alice.shopId, userId: member.userId, role: "member" });
  pressA = newId();
  await db.insert(presses).values({ id: pressA, shopId: alice.shopId, name: "Shop A press", frameType: "h-frame" });
});

describe("another shop's objects are not found", () => {
  it("in the data layer", async () => {
    await expect(getPress({ userId: bob.userId }, pressA)).rejects.toBeInstanceOf(NotFoundError);
    await expect(getPress({ userId: alice.userId }, pressA)).resolves.toMatchObject({ name: "Shop A press", role: "manager" });
    await expect(getPress({ userId: member.userId }, pressA)).resolves.toMatchObject({ role: "member" });
    expect(await listPresses({ userId: bob.userId }, alice.shopId)).toEqual([]);
    await expect(listMembers({ userId: bob.userId }, alice.shopId)).rejects.toBeInstanceOf(NotFoundError);
    await expect(switchActiveShop({ userId: bob.userId }, alice.shopId)).rejects.toBeInstanceOf(NotFoundError);
  });

  it("through the JSON API (404, and the same answer as an id that never existed)", async () => {
    const bobCookie = { cookie: `session=${(await createSession(bob.userId)).token}` };
    const aliceCookie = { cookie: `session=${(await createSession(alice.userId)).token}` };
    const foreign = await getPressRoute(getRequest(`/api/presses/${pressA}`, bobCookie), { params: Promise.resolve({ pressId: pressA }) });
    const missing = await getPressRoute(getRequest(`/api/presses/${newId()}`, bobCookie), { params: Promise.resolve({ pressId: newId() }) });
    expect(foreign.status).toBe(404);
    expect(missing.status).toBe(404);
    expect(await foreign.json()).toEqual(await missing.json());

    const own = await getPressRoute(getRequest(`/api/presses/${pressA}`, aliceCookie), { params: Promise.resolve({ pressId: pressA }) });
    expect(own.status).toBe(200);
    expect(((await own.json()) as { press: { name: string } }).press.name).toBe("Shop A press");

    const list = await listPressesRoute(getRequest(`/api/presses?shopId=${alice.shopId}`, bobCookie), {} as never);
    expect(((await list.json()) as { presses: unknown[] }).presses).toEqual([]);
    const anonymous = await getPressRoute(getRequest(`/api/presses/${pressA}`), { params: Promise.resolve({ pressId: pressA }) });
    expect(anonymous.status).toBe(401);
  });
});

describe("role rules are enforced by the data layer", () => {
  it("lets only a manager change shop settings and roles", async () => {
    await expect(updateShop({ userId: member.userId }, alice.shopId, { name: "Taken over", timeZone: "UTC" })).rejects.toBeInstanceOf(ForbiddenError);
    await expect(changeMemberRole({ userId: member.userId }, alice.shopId, member.userId, "manager")).rejects.toBeInstanceOf(ForbiddenError);
    const [shop] = await db.select({ name: shops.name }).from(shops).where(eq(shops.id, alice.shopId));
    expect(shop!.name).not.toBe("Taken over");

    await updateShop({ userId: alice.userId }, alice.shopId, { name: "Alice's forge", timeZone: "Europe/Berlin" });
    const [renamed] = await db.select().from(shops).where(eq(shops.id, alice.shopId));
    expect(renamed).toMatchObject({ name: "Alice's forge", timeZone: "Europe/Berlin" });
  });

  it("never leaves a shop without a manager", async () => {
    await expect(changeMemberRole({ userId: alice.userId }, alice.shopId, alice.userId, "member")).rejects.toBeInstanceOf(LastManagerError);
    await changeMemberRole({ userId: alice.userId }, alice.shopId, member.userId, "inspector");
    const members = await listMembers({ userId: alice.userId }, alice.shopId);
    expect(members.find((m) => m.userId === member.userId)?.role).toBe("inspector");
  });
});

describe("sign-up", () => {
  it("creates the user, a personal shop and a manager membership together", async () => {
    const user = await makeUser();
    const rows = await db.select().from(memberships).where(eq(memberships.userId, user.userId));
    expect(rows).toEqual([expect.objectContaining({ shopId: user.shopId, role: "manager" })]);
    const [shop] = await db.select().from(shops).where(eq(shops.id, user.shopId));
    expect(shop!.personal).toBe(true);
  });

  it("refuses a taken e-mail (any case) and leaves nothing half-created", async () => {
    const user = await makeUser();
    const [before] = await db.select({ n: count() }).from(shops);
    await expect(
      createUserWithPersonalShop({ email: user.email.toUpperCase(), displayName: "Copycat", password: "another fine passphrase" }),
    ).rejects.toBeInstanceOf(EmailTakenError);
    const [after] = await db.select({ n: count() }).from(shops);
    expect(after!.n).toBe(before!.n);
  });
});

describe("audit log", () => {
  it("is append-only for the app's database user", async () => {
    const [row] = await db.select({ id: auditLog.id }).from(auditLog).limit(1);
    expect(row).toBeDefined();
    await expect(db.update(auditLog).set({ action: "rewritten" }).where(eq(auditLog.id, row!.id))).rejects.toThrow();
    await expect(db.delete(auditLog).where(eq(auditLog.id, row!.id))).rejects.toThrow();
  });
});
