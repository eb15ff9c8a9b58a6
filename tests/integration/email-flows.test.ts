import { and, eq } from "drizzle-orm";
import nodemailer from "nodemailer";
import { beforeAll, describe, expect, it } from "vitest";
import { POST as remindersRoute } from "@/app/api/jobs/reminders/route";
import { db } from "@/db/client";
import { emailOutbox, invitations, memberships, presses, serviceTasks, sessions, shops, users } from "@/db/schema";
import { createSession } from "@/lib/auth/session";
import { verifyPassword } from "@/lib/auth/password";
import { acceptInvitation, createInvitation, getInvitation, revokeInvitation, signUpWithInvitation } from "@/lib/data/invitations";
import { requestPasswordReset, resetPassword, RESET_LIFETIME_MS } from "@/lib/data/password-resets";
import { createPress } from "@/lib/data/press-edits";
import { deliverDueEmails } from "@/lib/email/sender";
import { JOB_SECRET_HEADER } from "@/lib/email/jobs";
import { newId } from "@/lib/ids";
import { addLocalDays, localDate } from "@/lib/schedule";
import { jsonRequest, makeUser } from "./helpers";
import { messagesTo, tokenFrom } from "./mail";

type U = Awaited<ReturnType<typeof makeUser>>;
let manager: U;
const origin = "http://127.0.0.1:3000";
const unique = (name: string) => `${name}${Date.now().toString(36)}${Math.floor(Math.random() * 1e6)}@mail.example`;

/** Deliver everything queued, as the in-app sender would, to the SMTP fake. */
async function deliver(): Promise<void> {
  for (let i = 0; i < 10 && (await deliverDueEmails({ limit: 50 })).claimed > 0; i++);
}

beforeAll(async () => {
  manager = await makeUser();
  await db.update(shops).set({ name: "Anvil Row Workshop" }).where(eq(shops.id, manager.shopId));
});

describe("invitations", () => {
  it("mails a single-use link that lets a new person sign up into the shop", async () => {
    const email = unique("newcomer");
    await createInvitation({ userId: manager.userId }, manager.shopId, { email, role: "inspector" }, origin);
    await deliver();
    const [message] = await messagesTo(email);
    expect(message?.subject).toContain("Anvil Row Workshop");
    expect(message?.text).toContain("Anvil Row Workshop");
    expect(message?.html).toContain("Anvil Row Workshop");
    const token = tokenFrom(message!, "/invite");
    const view = await getInvitation(token);
    expect(view).toMatchObject({ ok: true, email, role: "inspector", accountExists: false });
    const joined = await signUpWithInvitation(token, { displayName: "New Inspector", password: "tongs-and-a-quench-tank" });
    expect("userId" in joined).toBe(true);
    const userId = (joined as { userId: string }).userId;
    const [membership] = await db.select().from(memberships).where(and(eq(memberships.userId, userId), eq(memberships.shopId, manager.shopId)));
    expect(membership?.role).toBe("inspector");
    expect(await getInvitation(token)).toEqual({ ok: false, reason: "used" });
  });

  it("lets a signed-in invitee join, and refuses expired, revoked and other people's links", async () => {
    const invitee = await makeUser();
    const { id } = await createInvitation({ userId: manager.userId }, manager.shopId, { email: invitee.email, role: "member" }, origin);
    await deliver();
    const token = tokenFrom((await messagesTo(invitee.email))[0]!, "/invite");
    const stranger = await makeUser();
    await expect(acceptInvitation({ userId: stranger.userId }, token)).rejects.toThrow(/is for/);
    // Past its expiry the link is refused.
    await db.update(invitations).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(invitations.id, id));
    expect(await acceptInvitation({ userId: invitee.userId }, token)).toEqual({ ok: false, reason: "expired" });
    await db.update(invitations).set({ expiresAt: new Date(Date.now() + 86_400_000) }).where(eq(invitations.id, id));
    expect(await acceptInvitation({ userId: invitee.userId }, token)).toMatchObject({ ok: true });
    expect(await acceptInvitation({ userId: invitee.userId }, token)).toEqual({ ok: false, reason: "used" });

    const later = unique("revoked");
    const { id: revokedId } = await createInvitation({ userId: manager.userId }, manager.shopId, { email: later, role: "member" }, origin);
    await deliver();
    await revokeInvitation({ userId: manager.userId }, revokedId);
    expect(await getInvitation(tokenFrom((await messagesTo(later))[0]!, "/invite"))).toEqual({ ok: false, reason: "used" });
    // Only managers invite.
    await expect(createInvitation({ userId: invitee.userId }, manager.shopId, { email: unique("x"), role: "member" }, origin)).rejects.toThrow();
  });
});

describe("password reset", () => {
  it("mails a link that works once, ends every session, and answers the same for unknown addresses", async () => {
    const user = await makeUser();
    await createSession(user.userId);
    await requestPasswordReset(user.email.toUpperCase(), origin);
    await deliver();
    const [message] = await messagesTo(user.email);
    const token = tokenFrom(message!, "/reset-password");
    expect(await resetPassword(token, "a-brand-new-passphrase-2026")).toMatchObject({ ok: true });
    const [row] = await db.select({ hash: users.passwordHash }).from(users).where(eq(users.id, user.userId));
    expect(await verifyPassword(row!.hash, "a-brand-new-passphrase-2026")).toBe(true);
    expect(await db.$count(sessions, eq(sessions.userId, user.userId))).toBe(0);
    expect(await resetPassword(token, "yet-another-passphrase-77")).toEqual({ ok: false, reason: "used" });

    const before = await db.$count(emailOutbox);
    await requestPasswordReset(unique("nobody"), origin);
    expect(await db.$count(emailOutbox)).toBe(before);
  });

  it("expires in under an hour", async () => {
    const user = await makeUser();
    await requestPasswordReset(user.email, origin);
    await deliver();
    const token = tokenFrom((await messagesTo(user.email))[0]!, "/reset-password");
    expect(RESET_LIFETIME_MS).toBeLessThan(3_600_000);
    expect(await resetPassword(token, "a-brand-new-passphrase-2026", new Date(Date.now() + RESET_LIFETIME_MS + 1000))).toEqual({ ok: false, reason: "expired" });
  });
});

describe("reminder digest", () => {
  it("lists exactly the due tasks and is sent once a day", async () => {
    process.env.JOBS_SECRET = "integration-test-job-secret";
    const owner = await makeUser();
    const actor = { userId: owner.userId };
    await db.update(shops).set({ name: "Quench Lane Smithy", timeZone: "America/Chicago" }).where(eq(shops.id, owner.shopId));
    const { id: pressId } = await createPress(actor, owner.shopId, { name: "Yard press", frameType: "h-frame", lifecycle: "in-service" });
    await db.update(presses).set({ hourMeter: 95 }).where(eq(presses.id, pressId));
    const today = localDate(new Date(), "America/Chicago");
    const task = (title: string, days: number | null, hours: number | null, lastDaysAgo: number, lastHours: number) => ({
      id: newId(), pressId, title, kind: "other" as const, intervalDays: days, intervalHours: hours, lastDoneOn: addLocalDays(today, -lastDaysAgo), lastDoneHours: lastHours,
    });
    await db.insert(serviceTasks).values([
      task("Grease the guide ways", 30, null, 40, 0), // overdue by date
      task("Check tie-rod nuts", null, 100, 0, 0), // due soon by hours (95 of 100)
      task("Repaint the guard", 365, null, 10, 0), // not due
    ]);
    const call = (secret?: string) => remindersRoute(jsonRequest("/api/jobs/reminders", {}, secret ? { [JOB_SECRET_HEADER]: secret } : {}), {} as never);
    expect((await call()).status).toBe(401);
    expect((await call("wrong-secret-wrong-secret")).status).toBe(401);
    expect((await call(process.env.JOBS_SECRET)).status).toBe(200);
    await deliver();
    const [digest, ...more] = await messagesTo(owner.email);
    expect(more).toHaveLength(0);
    expect(digest?.subject).toBe("Quench Lane Smithy: service 1 overdue, 1 due soon");
    const lines = digest!.text.split("\n").filter((l) => l.startsWith("- "));
    expect(lines).toEqual([expect.stringContaining("OVERDUE · Yard press · Grease the guide ways"), expect.stringContaining("Due soon · Yard press · Check tie-rod nuts")]);
    expect(digest!.html).toContain("Quench Lane Smithy");

    const again = (await (await call(process.env.JOBS_SECRET)).json()) as { queued: number; alreadySent: number };
    expect(again.alreadySent).toBeGreaterThanOrEqual(1);
    await deliver();
    expect(await messagesTo(owner.email)).toHaveLength(1);
  });
});

describe("sender", () => {
  it("keeps a message queued and retries with back-off while SMTP is down", async () => {
    const to = unique("retry");
    await db.insert(emailOutbox).values({ id: newId(), kind: "invitation", toAddress: to, subject: "Retry test", textBody: "Anvil Row Workshop", htmlBody: "<p>Anvil Row Workshop</p>" });
    const down = nodemailer.createTransport({ host: "127.0.0.1", port: 1, connectionTimeout: 2000 });
    // Other tests' rows may be due too; this transport fails them all, which is what SMTP down means.
    await deliverDueEmails({ transport: down, limit: 50 });
    const [row] = await db.select().from(emailOutbox).where(eq(emailOutbox.toAddress, to));
    expect(row).toMatchObject({ status: "pending", attempts: 1 });
    expect(row?.lastError).toMatch(/ECONNREFUSED|connect/i);
    expect(row!.nextAttemptAt.getTime()).toBeGreaterThan(Date.now() + 20_000);
    // Once the back-off has passed and SMTP is back, it goes out.
    await deliverDueEmails({ now: new Date(Date.now() + 60_000), limit: 50 });
    const [sent] = await db.select().from(emailOutbox).where(eq(emailOutbox.toAddress, to));
    expect(sent).toMatchObject({ status: "sent", attempts: 2 });
    expect(await messagesTo(to)).toHaveLength(1);
  });
});
