import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { GET as getMe } from "@/app/api/me/route";
import { POST as signOut } from "@/app/api/auth/sign-out/route";
import { db } from "@/db/client";
import { sessions, users } from "@/db/schema";
import { hashSecret, parseSessionToken } from "@/lib/auth/session-token";
import { ABSOLUTE_LIFETIME_MS, createSession, INACTIVITY_TIMEOUT_MS, validateSessionToken } from "@/lib/auth/session";
import { changePassword } from "@/lib/data/users";
import { getRequest, jsonRequest, makeUser } from "./helpers";

const noContext = {} as never;

describe("stored credentials", () => {
  it("stores the password as an argon2id hash with m=19456, t=2, p=1 (OWASP / ASVS appendix C)", async () => {
    const { userId, password } = await makeUser();
    const [row] = await db.select({ hash: users.passwordHash }).from(users).where(eq(users.id, userId));
    expect(row!.hash).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$[A-Za-z0-9+/]+\$[A-Za-z0-9+/]+$/);
    expect(row!.hash).not.toContain(password);
  });

  it("stores only SHA-256 of the session secret in a 32-byte binary column, never the cookie value", async () => {
    const { userId } = await makeUser();
    const { token } = await createSession(userId);
    const { id, secret } = parseSessionToken(token)!;
    const [row] = await db.select().from(sessions).where(eq(sessions.id, id));
    expect(Buffer.isBuffer(row!.secretHash)).toBe(true);
    expect(row!.secretHash.length).toBe(32);
    expect(row!.secretHash.equals(hashSecret(secret))).toBe(true);
    expect(row!.secretHash.toString("latin1")).not.toContain(secret);
    expect(JSON.stringify(row)).not.toContain(secret);
  });
});

describe("session validation", () => {
  it("accepts the right secret and refuses a changed one", async () => {
    const { userId } = await makeUser();
    const { token } = await createSession(userId);
    expect((await validateSessionToken(token))?.user.id).toBe(userId);
    const last = token.at(-1) === "a" ? "b" : "a";
    expect(await validateSessionToken(token.slice(0, -1) + last)).toBeNull();
    expect(await validateSessionToken("garbage")).toBeNull();
  });

  it("expires after the inactivity timeout and after the absolute lifetime", async () => {
    const { userId } = await makeUser();
    const start = new Date();
    const a = await createSession(userId, start);
    expect(await validateSessionToken(a.token, new Date(start.getTime() + INACTIVITY_TIMEOUT_MS + 1000))).toBeNull();

    const b = await createSession(userId, start);
    // Active every few days: the inactivity window keeps sliding, the absolute limit does not.
    for (let t = 3; t * 86_400_000 < ABSOLUTE_LIFETIME_MS; t += 3) {
      expect(await validateSessionToken(b.token, new Date(start.getTime() + t * 86_400_000))).not.toBeNull();
    }
    expect(await validateSessionToken(b.token, new Date(start.getTime() + ABSOLUTE_LIFETIME_MS + 1000))).toBeNull();
  });
});

describe("revocation", () => {
  it("rejects the old cookie after sign-out", async () => {
    const { userId } = await makeUser();
    const { token } = await createSession(userId);
    const cookie = { cookie: `session=${token}` };
    expect((await getMe(getRequest("/api/me", cookie), noContext)).status).toBe(200);

    const out = await signOut(jsonRequest("/api/auth/sign-out", undefined, cookie), noContext);
    expect(out.status).toBe(204);
    expect(out.headers.get("set-cookie")).toMatch(/session=;.*Max-Age=0/i);

    expect(await validateSessionToken(token)).toBeNull();
    expect((await getMe(getRequest("/api/me", cookie), noContext)).status).toBe(401);
  });

  it("ends every session of the user on a password change and issues a new one", async () => {
    const { userId, password } = await makeUser();
    const laptop = await createSession(userId);
    const phone = await createSession(userId);

    const wrong = await changePassword({ userId }, { currentPassword: "not it at all", newPassword: "a new long passphrase", ip: "t" });
    expect(wrong.ok).toBe(false);
    expect(await validateSessionToken(phone.token)).not.toBeNull();

    const result = await changePassword({ userId }, { currentPassword: password, newPassword: "a new long passphrase", ip: "t" });
    expect(result.ok).toBe(true);
    expect(await validateSessionToken(laptop.token)).toBeNull();
    expect(await validateSessionToken(phone.token)).toBeNull();
    expect((await getMe(getRequest("/api/me", { cookie: `session=${phone.token}` }), noContext)).status).toBe(401);
    if (result.ok) expect((await validateSessionToken(result.token))?.user.id).toBe(userId);
  });
});
