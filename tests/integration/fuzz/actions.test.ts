// Fuzzes the form inputs of the server actions whose data-layer function no route calls (the
// matrix's data cells with a form: shop settings, invitations, saving a sizing as a planned press).
// Each run does what the action does — the action's schema on the form's strings, then the
// data-layer function as the shop's manager — without the session and redirect plumbing.
// Property: a refused form gets field errors; a refusal from the data layer becomes a form message
// (refusalState does not rethrow, which would be a 500); an accepted form stored what was parsed,
// and an invitation's e-mail headers are single-line. Seed and runs as in bodies.test.ts.
import { and, eq, gte } from "drizzle-orm";
import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { z } from "zod";
import { db } from "@/db/client";
import { emailOutbox, shops } from "@/db/schema";
import { refusalState } from "@/lib/action-refusal";
import { normaliseEmail } from "@/lib/auth/sign-in";
import { createInvitation } from "@/lib/data/invitations";
import { createPlannedPressFromSizing, getPress } from "@/lib/data/presses";
import { updateShop } from "@/lib/data/shops";
import { invitationInputSchema } from "@/lib/validation/email-links";
import { fieldErrorsOf } from "@/lib/validation/field-errors";
import { plannedPressSchema } from "@/lib/validation/planned-press";
import { shopSettingsSchema } from "@/lib/validation/shop";
import { FULL_SIZING_INPUT } from "../../fixtures/sizing-inputs";
import { makeWorld, type Shop } from "../authz/world";
import { differences } from "./bodies";
import { fromZod, hostileFormText, hostileVariant, toJsonText } from "./arbitraries";

const SEED = Number(process.env.FUZZ_SEED ?? Math.floor(Math.random() * 2 ** 31));
const RUNS = Number(process.env.FUZZ_RUNS ?? 12);

let shop: Shop;
let started: Date;

beforeAll(async () => {
  started = new Date(Date.now() - 1000);
  shop = (await makeWorld()).a;
  console.info(`[fuzz actions] seed ${SEED}, ${RUNS} runs per action (replay: FUZZ_SEED=${SEED} FUZZ_RUNS=${RUNS})`);
});

afterAll(async () => {
  await db.delete(emailOutbox).where(gte(emailOutbox.createdAt, started));
});

type Form = Record<string, string | null>;
type Case = {
  action: string;
  schema: z.ZodType;
  /** A form field's value: what the page would send, or hostile text; null is a missing field. */
  fields: Record<string, fc.Arbitrary<string>>;
  /** The data-layer call with the parsed form, and what it stored against what was parsed. */
  run: (actor: { userId: string }, parsed: Record<string, unknown>) => Promise<{ actual: unknown; expected: unknown }>;
};

/** Mostly what the page sends, now and then something hostile. */
const likely = (page: fc.Arbitrary<string>, hostile: fc.Arbitrary<string> = hostileFormText) => fc.oneof({ weight: 3, arbitrary: page }, { weight: 1, arbitrary: hostile });

const CASES: Case[] = [
  {
    action: "updateShopAction",
    schema: shopSettingsSchema,
    fields: { name: likely(fromZod(shopSettingsSchema.shape.name).map(String)), timeZone: likely(fc.constantFrom("Europe/London", "America/Chicago", "UTC"), fc.constantFrom("Mars/Olympus", "'; DROP TABLE shops;--", "utc")) },
    run: async (actor, parsed) => {
      await updateShop(actor, shop.shopId, parsed as { name: string; timeZone: string });
      const [row] = await db.select({ name: shops.name, timeZone: shops.timeZone }).from(shops).where(eq(shops.id, shop.shopId));
      return { actual: row, expected: parsed };
    },
  },
  {
    action: "inviteAction",
    schema: invitationInputSchema,
    fields: {
      email: likely(fc.tuple(fc.stringMatching(/^[a-z0-9](?:[a-z0-9._+-]{0,14}[a-z0-9])?$/), fc.constantFrom("example.com", "Test.Example", "xn--bcher-kva.example")).map(([l, d]) => `${l}@${d}`), fc.oneof(hostileFormText, fc.constantFrom("a@b.example\r\nBcc: victim@example.com", "a@b.example\nx", " A@B.Example "))),
      role: likely(fc.constantFrom("member", "inspector", "manager"), fc.constantFrom("owner", "", "member\n")),
    },
    run: async (actor, parsed) => {
      const { id } = await createInvitation(actor, shop.shopId, parsed as { email: string; role: "member" }, "http://127.0.0.1:3000");
      const [mail] = await db.select().from(emailOutbox).where(and(eq(emailOutbox.kind, "invitation"), gte(emailOutbox.createdAt, started), eq(emailOutbox.toAddress, normaliseEmail(parsed.email as string))));
      const singleLine = mail !== undefined && !/[\r\n]/.test(mail.toAddress + mail.subject);
      return { actual: { invited: Boolean(id), singleLine }, expected: { invited: true, singleLine: true } };
    },
  },
  {
    action: "savePlannedPressAction",
    schema: plannedPressSchema,
    fields: {
      name: likely(fromZod(plannedPressSchema.shape.name).map(String)),
      frameType: likely(fc.constantFrom("h-frame", "c-frame", "four-post", "other"), fc.constantFrom("h-frame\r\n", "", "H-FRAME")),
      sizingInput: likely(fc.constant(JSON.stringify(FULL_SIZING_INPUT)), fc.oneof(hostileVariant(fc.constant(FULL_SIZING_INPUT)).map(toJsonText), hostileFormText)),
    },
    run: async (actor, parsed) => {
      const { id } = await createPlannedPressFromSizing(actor, shop.shopId, { name: parsed.name as string, frameType: parsed.frameType as "h-frame", input: parsed.sizingInput as never });
      return { actual: await getPress(actor, id), expected: { name: parsed.name, frameType: parsed.frameType, lifecycle: "planned" } };
    },
  },
];

describe.each(CASES.map((c) => [c.action, c] as const))("%s form inputs", (_name, c) => {
  it("refuses with field errors or a form message, never an error page, and stores what was parsed", async () => {
    const form: fc.Arbitrary<Form> = fc.record(Object.fromEntries(Object.entries(c.fields).map(([k, arb]) => [k, fc.option(arb, { nil: null, freq: 10 })])));
    const tally = { refusedForm: 0, refusedData: 0, stored: 0 };
    const property = fc.asyncProperty(form, async (values) => {
      const parsed = c.schema.safeParse(values);
      if (!parsed.success) {
        const errors = fieldErrorsOf(parsed.error.issues);
        if (Object.keys(errors).length === 0) throw new Error("refused without a field error");
        tally.refusedForm += 1;
        return;
      }
      const actor = { userId: shop.users.manager.userId };
      let stored: { actual: unknown; expected: unknown };
      try {
        stored = await c.run(actor, parsed.data as Record<string, unknown>);
      } catch (error) {
        refusalState(error, {}); // rethrows what the action would turn into an error page
        tally.refusedData += 1;
        return;
      }
      const problems = differences(stored.expected, stored.actual);
      if (problems.length > 0) throw new Error(problems.join("\n"));
      tally.stored += 1;
    });
    const details = await fc.check(property, { seed: SEED, numRuns: RUNS, endOnFailure: !process.env.FUZZ_SHRINK });
    console.info(`[fuzz actions] ${c.action}: ${details.numRuns} runs, seed ${SEED}${details.failed ? `, FAILED at path ${details.counterexamplePath}` : ""}; ${JSON.stringify(tally)}`);
    const failure = details.errorInstance instanceof Error ? details.errorInstance.message : "";
    expect(details.failed, `${fc.defaultReportMessage(details) ?? ""}\n${failure}`).toBe(false);
  }, 120_000);
});
