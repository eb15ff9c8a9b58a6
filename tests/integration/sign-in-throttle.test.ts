import { describe, expect, it } from "vitest";
import { POST as signIn } from "@/app/api/auth/sign-in/route";
import { LIMITS } from "@/lib/auth/throttle";
import { jsonRequest, makeUser } from "./helpers";

const noContext = {} as never;

function attempt(email: string, password: string, headers: Record<string, string> = {}): Promise<Response> {
  return signIn(jsonRequest("/api/auth/sign-in", { email, password }, headers), noContext);
}

describe("sign-in", () => {
  it("signs in with the right password and sets an HttpOnly, SameSite=Lax session cookie on /", async () => {
    const user = await makeUser();
    const res = await attempt(user.email.toUpperCase(), user.password);
    expect(res.status).toBe(200);
    const cookie = res.headers.get("set-cookie") ?? "";
    expect(cookie).toMatch(/^session=[a-z2-7]{24}\.[a-z2-7]{52};/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=lax/i);
    expect(cookie).toMatch(/Path=\//);
  });

  it("answers an unknown e-mail exactly like a wrong password", async () => {
    const user = await makeUser();
    const wrong = await attempt(user.email, "definitely not the password");
    const unknown = await attempt(`nobody-${Date.now()}@test.example`, "definitely not the password");
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(await unknown.json()).toEqual(await wrong.json());
  });

  it("answers the 11th wrong password in a row with 429 and Retry-After, however X-Forwarded-For rotates", async () => {
    expect(LIMITS.account.free).toBe(10);
    const user = await makeUser();
    for (let i = 1; i <= 10; i++) {
      const res = await attempt(user.email, `wrong password ${i}`, { "x-forwarded-for": `203.0.113.${i}` });
      expect(res.status, `attempt ${i}`).toBe(401);
    }
    const eleventh = await attempt(user.email, "wrong password 11", { "x-forwarded-for": "198.51.100.77" });
    expect(eleventh.status).toBe(429);
    expect(Number(eleventh.headers.get("retry-after"))).toBeGreaterThan(0);

    // Even the right password waits until the lock ends.
    const right = await attempt(user.email, user.password, { "x-forwarded-for": "192.0.2.200" });
    expect(right.status).toBe(429);
  });

  it("throttles one address trying many accounts, and a forged X-Forwarded-For does not escape it", async () => {
    const ip = { "x-presswright-client-ip": `10.${Date.now() % 250}.0.9` };
    for (let i = 0; i < LIMITS.ip.free; i++) {
      const res = await attempt(`spray-${i}-${Date.now()}@test.example`, "some wrong password", {
        ...ip,
        "x-forwarded-for": `203.0.113.${i}`,
      });
      expect(res.status).toBe(401);
    }
    const next = await attempt(`spray-last-${Date.now()}@test.example`, "some wrong password", {
      ...ip,
      "x-forwarded-for": "192.0.2.1",
    });
    expect(next.status).toBe(429);
    expect(Number(next.headers.get("retry-after"))).toBeGreaterThan(0);
  });

  it("refuses cross-site sign-in posts before touching any account", async () => {
    const user = await makeUser();
    const foreign = await attempt(user.email, user.password, { origin: "https://evil.example" });
    expect(foreign.status).toBe(403);
    const crossSite = await attempt(user.email, user.password, { "sec-fetch-site": "cross-site" });
    expect(crossSite.status).toBe(403);
    const res = await signIn(
      jsonRequest("/api/auth/sign-in", { email: user.email, password: user.password }, { origin: "" }),
      noContext,
    );
    expect(res.status).toBe(403);
  });

  it("rejects malformed bodies and unknown keys with 400", async () => {
    const bad = await signIn(jsonRequest("/api/auth/sign-in", { email: "a@b.c", password: "x", role: "manager" }), noContext);
    expect(bad.status).toBe(400);
    const notJson = await signIn(jsonRequest("/api/auth/sign-in", undefined), noContext);
    expect(notJson.status).toBe(400);
  });
});
