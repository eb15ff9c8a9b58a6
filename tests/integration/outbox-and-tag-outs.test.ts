import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { emailOutbox, presses } from "@/db/schema";
import { clearOpenTagOuts, insertTagOut, listOpenTagOuts } from "@/lib/data/tag-outs";
import { enqueueEmail } from "@/lib/email/outbox";
import { newId } from "@/lib/ids";
import { makeUser } from "./helpers";

describe("e-mail outbox", () => {
  it("queues a message once per dedupe key and strips line breaks from the subject", async () => {
    const key = `test-${newId()}`;
    const message = { kind: "reminder-digest" as const, to: "a@test.example", subject: "Due\r\nBcc: x@evil.example", text: "t", html: "<p>t</p>", dedupeKey: key };
    const first = await enqueueEmail(db, message);
    const second = await enqueueEmail(db, message);
    expect(first).toMatch(/^[a-z2-7]{24}$/);
    expect(second).toBeNull();
    const rows = await db.select().from(emailOutbox).where(eq(emailOutbox.dedupeKey, key));
    expect(rows).toHaveLength(1);
    expect(rows[0]?.subject).toBe("Due Bcc: x@evil.example");
    expect(rows[0]?.status).toBe("pending");
  });

  it("refuses a recipient with a header break", async () => {
    await expect(enqueueEmail(db, { kind: "invitation", to: "a@test.example\r\nBcc: b@x", subject: "s", text: "t", html: "h" })).rejects.toThrow();
  });
});

describe("tag-outs", () => {
  it("lists open tag-outs per press and clears them by source", async () => {
    const { userId, shopId } = await makeUser();
    const pressId = newId();
    await db.insert(presses).values({ id: pressId, shopId, name: "Tag-out test press", frameType: "h-frame" });
    const problemId = newId();
    await insertTagOut(db, { pressId, source: "problem", sourceId: problemId, reason: "Hose weeping at the cap end", taggedBy: userId });
    await insertTagOut(db, { pressId, source: "manual", reason: "Pump being rebuilt", taggedBy: userId });
    expect((await listOpenTagOuts(db, [pressId])).get(pressId)).toHaveLength(2);
    expect(await clearOpenTagOuts(db, { pressId, source: "problem", sourceId: problemId, clearedBy: userId, clearReason: "Hose replaced" })).toBe(1);
    const open = (await listOpenTagOuts(db, [pressId])).get(pressId) ?? [];
    expect(open.map((t) => t.source)).toEqual(["manual"]);
    expect(await listOpenTagOuts(db, [])).toEqual(new Map());
  });
});
