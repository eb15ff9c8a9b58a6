import { db } from "@/db/client";
import { memberships, presses, shops } from "@/db/schema";
import { createSession } from "@/lib/auth/session";
import { newId } from "@/lib/ids";
import { makeUser } from "./helpers";

export type TestUser = Awaited<ReturnType<typeof makeUser>>;

export const cookie = async (u: TestUser): Promise<{ cookie: string }> => ({ cookie: `session=${(await createSession(u.userId)).token}` });
export const params = <K extends string>(key: K, value: string) => ({ params: Promise.resolve({ [key]: value } as Record<K, string>) });

/** A shared shop (London time) with a manager, an inspector, two members, an outsider and one press in service. */
export async function makeSharedShop(): Promise<{ shopId: string; pressId: string; manager: TestUser; inspector: TestUser; member: TestUser; member2: TestUser; outsider: TestUser }> {
  const [manager, inspector, member, member2, outsider] = await Promise.all([makeUser(), makeUser(), makeUser(), makeUser(), makeUser()]);
  const shopId = newId();
  const pressId = newId();
  await db.insert(shops).values({ id: shopId, name: "Test Community Forge", timeZone: "Europe/London" });
  await db.insert(memberships).values([
    { shopId, userId: manager.userId, role: "manager" },
    { shopId, userId: inspector.userId, role: "inspector" },
    { shopId, userId: member.userId, role: "member" },
    { shopId, userId: member2.userId, role: "member" },
  ]);
  await db.insert(presses).values({ id: pressId, shopId, name: "Test 20 t press", frameType: "h-frame", lifecycle: "in-service" });
  return { shopId, pressId, manager, inspector, member, member2, outsider };
}

/** A future slot on a whole hour, `hoursAhead` from now, `length` hours long, as ISO strings with offset. */
export function futureSlot(hoursAhead: number, length = 1): { startsAt: string; endsAt: string } {
  const start = Math.ceil(Date.now() / 3_600_000) * 3_600_000 + hoursAhead * 3_600_000;
  return { startsAt: new Date(start).toISOString(), endsAt: new Date(start + length * 3_600_000).toISOString() };
}
