// GET /api/session: what the prerendered public pages learn about their visitor on the client.
import { describe, expect, it } from "vitest";
import { GET as getSession } from "@/app/api/session/route";
import { createSession, invalidateSession } from "@/lib/auth/session";
import { getRequest, makeUser } from "./helpers";
import { makeSharedShop } from "./shop-context";

const noContext = {} as never;

async function sessionOf(headers: Record<string, string> = {}): Promise<{ status: number; body: Record<string, unknown> }> {
  const res = await getSession(getRequest("/api/session", headers), noContext);
  return { status: res.status, body: (await res.json()) as Record<string, unknown> };
}

describe("GET /api/session", () => {
  it("answers a signed-out visitor 200 with signedIn false, also for a cookie that names no session", async () => {
    expect(await sessionOf()).toEqual({ status: 200, body: { signedIn: false } });
    expect(await sessionOf({ cookie: "session=not-a-session.token" })).toEqual({ status: 200, body: { signedIn: false } });
  });

  it("names the signed-in user, the working shop and every shop with the role, and nothing else of the account", async () => {
    const { shopId, member } = await makeSharedShop();
    const { token } = await createSession(member.userId);
    const { status, body } = await sessionOf({ cookie: `session=${token}` });
    expect(status).toBe(200);
    expect(body.signedIn).toBe(true);
    expect(Object.keys(body.user as object).sort()).toEqual(["displayName", "email", "unitSystem"]);
    expect(body.user).toMatchObject({ email: member.email, unitSystem: "metric" });
    const shops = body.shops as { id: string; role: string }[];
    expect(shops.map((s) => [s.id, s.role]).sort()).toEqual(
      [[member.shopId, "manager"], [shopId, "member"]].sort(),
    );
    expect(shops.map((s) => s.id)).toContain((body.shop as { id: string }).id);
  });

  it("stops naming the user once the session has ended", async () => {
    const { userId } = await makeUser();
    const { token, session } = await createSession(userId);
    expect((await sessionOf({ cookie: `session=${token}` })).body.signedIn).toBe(true);
    await invalidateSession(session.id);
    expect((await sessionOf({ cookie: `session=${token}` })).body).toEqual({ signedIn: false });
  });
});
