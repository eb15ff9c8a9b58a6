// Hardening #6: sign-up answers the same whether or not the address has an account; the owner of a
// taken address gets an e-mail through the outbox; sign-up is limited per address in MariaDB.
// Hardening #7: every check of the current password goes through the sign-in account throttle.
import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { POST as signInRoute } from "@/app/api/auth/sign-in/route";
import { db } from "@/db/client";
import { emailOutbox, users } from "@/db/schema";
import { LIMITS } from "@/lib/auth/throttle";
import { requestAccount } from "@/lib/data/sign-up";
import { changePassword } from "@/lib/data/users";
import { SIGN_UP_ADDRESS_LIMIT } from "@/lib/rate-limit";
import { jsonRequest, makeUser } from "./helpers";

let n = 0;
const freshAddress = () => `new-${Date.now().toString(36)}-${++n}@test.example`;
const ip = () => `192.0.2.${(n % 250) + 1}`;

async function outboxFor(address: string) {
  return db.select().from(emailOutbox).where(and(eq(emailOutbox.toAddress, address), eq(emailOutbox.kind, "sign-up-attempt")));
}

describe("sign-up", () => {
  it("answers a taken address exactly like a new one, creates nothing, and mails the owner", async () => {
    const owner = await makeUser();
    const fresh = freshAddress();
    const forNew = await requestAccount({ email: fresh, displayName: "New Person", password: "a long new password" }, ip());
    const forTaken = await requestAccount({ email: owner.email.toUpperCase(), displayName: "Someone Else", password: "another long password" }, ip());
    expect(forTaken).toEqual(forNew);
    expect(forNew).toEqual({ ok: true });

    const [created] = await db.select({ id: users.id }).from(users).where(eq(users.email, fresh));
    expect(created).toBeDefined();
    expect(await db.select({ id: users.id }).from(users).where(eq(users.email, owner.email))).toHaveLength(1);

    const [mail] = await outboxFor(owner.email);
    expect(mail).toMatchObject({ status: "pending", subject: expect.stringMatching(/tried to create a Presswright account/) });
    expect(mail!.textBody).toMatch(/Hello Test User/);
    expect(mail!.textBody).toMatch(/nothing was created/);
    expect(mail!.htmlBody).toMatch(/<p>Hello Test User/);
    expect(await outboxFor(fresh)).toHaveLength(0);
  });

  it("mails the owner at most once an hour however often the address is tried", async () => {
    const owner = await makeUser();
    for (let i = 0; i < 3; i++) await requestAccount({ email: owner.email, displayName: "X", password: "a long new password" }, ip());
    expect(await outboxFor(owner.email)).toHaveLength(1);
  });

  it("is limited per address, the same way for a taken and a free address", async () => {
    const owner = await makeUser();
    const free = freshAddress();
    const run = async (email: string) => {
      const results = [];
      // Different IPs: the per-address limit holds whoever asks.
      for (let i = 0; i <= SIGN_UP_ADDRESS_LIMIT.limit; i++) results.push(await requestAccount({ email, displayName: "X", password: "a long new password" }, `198.51.100.${i + 1}`));
      return results.map((r) => r.ok);
    };
    const taken = await run(owner.email);
    const fresh = await run(free);
    expect(taken).toEqual(fresh);
    expect(taken.at(-1)).toBe(false);
    expect(taken.slice(0, -1).every(Boolean)).toBe(true);
  });
});

describe("checking the current password", () => {
  it("goes through the account throttle shared with sign-in", async () => {
    const user = await makeUser();
    for (let i = 1; i <= LIMITS.account.free; i++) {
      const result = await changePassword({ userId: user.userId }, { currentPassword: `wrong ${i}`, newPassword: "a brand new password", ip: `203.0.113.${i}` });
      expect(result, `guess ${i}`).toEqual({ ok: false, reason: "wrong-current" });
    }
    // Locked now: even the right password is not checked, from any address.
    const locked = await changePassword({ userId: user.userId }, { currentPassword: user.password, newPassword: "a brand new password", ip: "203.0.113.200" });
    expect(locked).toMatchObject({ ok: false, reason: "throttled", retryAfterS: expect.any(Number) });
    // The same counter guards sign-in to that account.
    const signIn = await signInRoute(jsonRequest("/api/auth/sign-in", { email: user.email, password: user.password }), {} as never);
    expect(signIn.status).toBe(429);
  });

  it("still changes the password with the right current one", async () => {
    const user = await makeUser();
    const result = await changePassword({ userId: user.userId }, { currentPassword: user.password, newPassword: "a brand new password", ip: "203.0.113.9" });
    expect(result.ok).toBe(true);
  });
});
