// What the body fuzzer knows of each route that reads a JSON body: the schema the route parses
// with (for the well-shaped values and for what a 2xx must have stored), the request (the matrix
// row's, or a fresh object where a success would change shared state) and how to read the stored
// record back. bodies.test.ts fails when a route reads a body without an entry here.
import { and, eq } from "drizzle-orm";
import fc from "fast-check";
import { db } from "@/db/client";
import { pressTagOuts } from "@/db/schema";
import { listPressBookings } from "@/lib/data/bookings";
import { getComponent } from "@/lib/data/components";
import { getTemplate } from "@/lib/data/inspection-templates";
import { getInspection } from "@/lib/data/inspections";
import { listHourReadings } from "@/lib/data/press-edits";
import { getPress } from "@/lib/data/presses";
import { getPhoto } from "@/lib/data/photos";
import { listProblems } from "@/lib/data/problems";
import { listPressTagOuts } from "@/lib/data/press-tag-outs";
import { getServiceEntry } from "@/lib/data/service-log";
import { getServicePlan } from "@/lib/data/service-plan";
import { COMPONENT_KINDS } from "@/db/schema/components";
import { SPEC_SCHEMAS } from "@/lib/validation/component-spec";
import { signInSchema } from "@/lib/validation/auth";
import { answerPatchSchema, signInspectionSchema, startInspectionSchema, tagOutReasonSchema, templateInputSchema } from "@/lib/validation/inspection";
import { photoPatchFields, photoPatchSchema } from "@/lib/validation/photo";
import {
  componentInputSchema, componentPatchSchema, hourCorrectionSchema, hourReadingSchema, pressInputSchema, pressPatchSchema, replaceComponentSchema,
} from "@/lib/validation/press";
import { parsePlanPost, serviceEntryInputSchema, serviceEntryPatchSchema, serviceTaskInputSchema } from "@/lib/validation/service";
import { bookingInputSchema, problemCloseSchema, problemInputSchema } from "@/lib/validation/shop-use";
import { sizingInputSchema } from "@/lib/validation/sizing";
import { FULL_SIZING_INPUT } from "../../fixtures/sizing-inputs";
import type { Call } from "../authz/matrix";
import { fromZod, pastDateArb } from "./arbitraries";
import { freshPress, nextSlot, op, type Shop } from "../authz/world";

type Actor = { userId: string };
/** A matrix shop plus what some arbitraries draw from. */
export type FuzzShop = Shop & { monthlyItemKeys: string[] };
/** What a 2xx stored (read back through the data layer) and what the parsed body says it should be. */
export type Stored = { actual: unknown; expected: unknown };
type Json = Record<string, unknown>;

export type FuzzSpec = {
  /** Well-shaped bodies for this route in this shop. */
  valid: (shop: FuzzShop) => fc.Arbitrary<unknown>;
  /** The request to send instead of the matrix row's (a fresh object where a success would change shared state). */
  call?: (shop: Shop) => Promise<Call>;
} & (
  | {
      /** The route's own parse of the body (throws when the route would refuse it). */
      parse: (body: unknown) => unknown;
      /** Reads the stored record back after a 2xx. */
      stored: (ctx: { actor: Actor; call: Call; response: Json; parsed: Json; shop: Shop }) => Promise<Stored>;
    }
  | { /** Why a 2xx leaves no record to compare (the route stores nothing of the body). */ stateless: string }
);

const omit = (value: unknown, ...keys: string[]): Json => Object.fromEntries(Object.entries(value as Json).filter(([k]) => !keys.includes(k)));

const withPress = (pressId: string, tail: string): Call => ({ path: `/api/presses/${pressId}${tail}`, params: { pressId } });
const onFreshPress = (tail: string) => async (s: Shop): Promise<Call> => withPress(await freshPress(s), tail);

/** A component of any kind with a spec of that kind's shape. */
const componentArb: fc.Arbitrary<unknown> = fromZod(componentInputSchema).chain((common) => {
  const kind = (common as Json).kind as (typeof COMPONENT_KINDS)[number];
  return fromZod(SPEC_SCHEMAS[kind]).map((spec) => ({ ...(common as Json), spec: omit(spec, "kind") }));
});

/** A whole-minute slot some hours or days ahead, written with a UTC or a numeric offset. */
const slotArb = fc.tuple(fc.integer({ min: 1, max: 24 * 40 }), fc.integer({ min: 1, max: 8 }), fc.constantFrom(0, 60, -300, 330)).map(([ahead, hours, offsetMin]) => {
  const base = nextSlot();
  const start = new Date(base.startsAt).getTime() + ahead * 3_600_000;
  const iso = (ms: number) => {
    if (offsetMin === 0) return new Date(ms).toISOString();
    const local = new Date(ms + offsetMin * 60_000).toISOString().slice(0, 19);
    const sign = offsetMin < 0 ? "-" : "+";
    const abs = Math.abs(offsetMin);
    return `${local}${sign}${String(Math.floor(abs / 60)).padStart(2, "0")}:${String(abs % 60).padStart(2, "0")}`;
  };
  return { startsAt: iso(start), endsAt: iso(start + hours * 3_600_000) };
});

/**
 * Service-log fields that fit the entry's kind (an ISO code only on an oil sample, relief settings
 * only on a relief check), done in the past and naming no parts that do not exist, so most
 * well-shaped entries get through to the database.
 */
function fitServiceKind(body: unknown, iso4406: string, kind: string): Json {
  const e: Json = { ...(body as Json) };
  if (typeof e.performedOn === "string") e.performedOn = e.performedOn < new Date().toISOString().slice(0, 10) ? e.performedOn : "2024-02-29";
  if (kind !== "oil-sample") delete e.iso4406;
  else e.iso4406 = iso4406;
  if (kind !== "relief-checked") {
    delete e.reliefFoundBar;
    delete e.reliefSetBar;
  } else if (e.reliefFoundBar == null && e.reliefSetBar == null) e.reliefSetBar = 180;
  delete e.componentId;
  delete e.replacementLabel;
  if (Array.isArray(e.parts)) e.parts = e.parts.map((p) => omit(p, "componentId"));
  return e;
}
const ISO_CODES = fc.constantFrom("18/16/13", "-/15/12", "21/19/16");
const serviceEntryArb = fc.tuple(fromZod(serviceEntryInputSchema), ISO_CODES, pastDateArb).map(([b, iso, day]) => {
  const kind = (b as Json).kind === "hose-replaced" ? "other" : ((b as Json).kind as string);
  return fitServiceKind({ ...(b as Json), kind, performedOn: day }, iso, kind);
});
/** Corrections of the matrix's entries, which are of kind "other". */
const serviceEntryPatchArb = fc.tuple(fromZod(serviceEntryPatchSchema), pastDateArb).map(([b, day]) => fitServiceKind({ ...(b as Json), ...("performedOn" in (b as Json) ? { performedOn: day } : {}) }, "", "other"));

export const FUZZ: Record<string, FuzzSpec> = {
  "POST app/api/auth/sign-in/route.ts": {
    valid: (s) => fc.oneof(fromZod(signInSchema), fc.constant({ email: s.users.member.email, password: s.users.member.password })),
    stateless: "a right password starts a session; nothing of the body is stored",
  },
  "POST app/api/sizing/route.ts": {
    valid: () => fc.oneof(fromZod(sizingInputSchema), fc.constant(FULL_SIZING_INPUT)),
    stateless: "the engine's answer; nothing is stored",
  },
  "POST app/api/uploadthing/route.ts": {
    valid: () => fc.record({ files: fc.array(fc.record({ name: fc.string(), size: fc.nat(), type: fc.string() })), input: fc.record({ pressId: fc.string(), kind: fc.string() }) }),
    call: async () => ({ path: "/api/uploadthing?slug=pressPhoto&actionType=upload" }),
    stateless: "the upload SDK's own request; a photo is stored only after the upload service calls back (photos.test.ts)",
  },

  "POST app/api/presses/route.ts": {
    valid: (s) => fromZod(pressInputSchema).map((b) => ({ ...(b as Json), shopId: s.shopId })),
    parse: (body) => pressInputSchema.parse(omit(body, "shopId")),
    stored: async ({ actor, response, parsed }) => ({ actual: await getPress(actor, response.id as string), expected: parsed }),
  },
  "PATCH app/api/presses/[pressId]/route.ts": {
    valid: () => fromZod(pressPatchSchema),
    call: onFreshPress(""),
    parse: (body) => pressPatchSchema.parse(body),
    stored: async ({ actor, call, parsed }) => ({ actual: await getPress(actor, call.params!.pressId!), expected: parsed }),
  },
  "POST app/api/presses/[pressId]/components/route.ts": {
    valid: () => componentArb,
    call: onFreshPress("/components"),
    parse: (body) => componentInputSchema.parse(body),
    stored: async ({ actor, response, parsed }) => ({ actual: await getComponent(actor, response.id as string), expected: parsed }),
  },
  "PATCH app/api/components/[componentId]/route.ts": {
    valid: () => fc.tuple(fromZod(componentPatchSchema), fc.option(fromZod(SPEC_SCHEMAS.gauge))).map(([b, spec]) => (spec ? { ...(b as Json), spec: omit(spec, "kind") } : omit(b, "spec"))),
    parse: (body) => componentPatchSchema.parse(body),
    stored: async ({ actor, call, parsed }) => {
      const actual = await getComponent(actor, call.params!.componentId!);
      return { actual, expected: parsed.spec ? { ...parsed, spec: { ...(parsed.spec as Json), kind: "gauge" } } : parsed };
    },
  },
  "POST app/api/components/[componentId]/replace/route.ts": {
    valid: () => fc.record({ reason: fromZod(replaceComponentSchema.shape.reason), removedOn: pastDateArb, replacement: componentArb }),
    parse: (body) => ({ ...replaceComponentSchema.parse(body), replacement: componentInputSchema.parse((body as Json).replacement) }),
    stored: async ({ actor, call, response, parsed }) => {
      const old = await getComponent(actor, call.params!.componentId!);
      // A replacement without its own installation date was installed the day the old part came off.
      const replacement = parsed.replacement as Json;
      const added = { ...replacement, installedOn: replacement.installedOn ?? parsed.removedOn };
      return { actual: { old, added: await getComponent(actor, response.id as string) }, expected: { old: { removalReason: parsed.reason, removedOn: parsed.removedOn, replacedById: response.id }, added } };
    },
  },
  "POST app/api/presses/[pressId]/hour-meter/route.ts": {
    valid: () => fromZod(hourReadingSchema),
    parse: (body) => hourReadingSchema.parse(body),
    stored: async ({ actor, call, parsed }) => ({ actual: (await listHourReadings(actor, call.params!.pressId!))[0], expected: { ...parsed, kind: "reading" } }),
  },
  "POST app/api/presses/[pressId]/hour-meter/corrections/route.ts": {
    valid: () => fromZod(hourCorrectionSchema),
    parse: (body) => hourCorrectionSchema.parse(body),
    stored: async ({ actor, call, parsed }) => ({ actual: (await listHourReadings(actor, call.params!.pressId!))[0], expected: { hours: parsed.hours, note: parsed.reason, kind: "correction" } }),
  },
  "PATCH app/api/photos/[photoId]/route.ts": {
    valid: () => fromZod(photoPatchFields),
    parse: (body) => photoPatchSchema.parse(body),
    stored: async ({ actor, call, parsed }) => ({ actual: await getPhoto(actor, call.params!.photoId!), expected: parsed }),
  },
  "POST app/api/presses/[pressId]/bookings/route.ts": {
    valid: () => slotArb,
    parse: (body) => bookingInputSchema.parse(body),
    stored: async ({ actor, call, response, parsed }) => {
      const { startsAt, endsAt } = parsed as { startsAt: Date; endsAt: Date };
      const list = await listPressBookings(actor, call.params!.pressId!, startsAt, endsAt);
      return { actual: list.find((b) => b.id === response.id), expected: { startsAt, endsAt } };
    },
  },
  "POST app/api/presses/[pressId]/problems/route.ts": {
    valid: () => fromZod(problemInputSchema),
    // A stop-use report tags its press out: never the shop's shared press.
    call: onFreshPress("/problems"),
    parse: (body) => problemInputSchema.parse(body),
    stored: async ({ actor, call, response, parsed }) => ({ actual: (await listProblems(actor, call.params!.pressId!)).open.find((p) => p.id === response.id), expected: parsed }),
  },
  "PATCH app/api/problems/[problemId]/route.ts": {
    // A made-up service-log entry id is refused: mostly close with a reason alone.
    valid: () => fc.tuple(fromZod(problemCloseSchema), fc.boolean()).map(([b, keepEntry]) => (keepEntry ? b : { ...omit(b, "serviceEntryId"), reason: (b as Json).reason ?? "Fixed it" })),
    parse: (body) => problemCloseSchema.parse(body),
    stored: async ({ actor, call, shop, parsed }) => {
      const closed = (await listProblems(actor, shop.pressId)).closed.find((p) => p.id === call.params!.problemId);
      return { actual: closed, expected: { closeReason: parsed.reason ?? null, serviceEntryId: parsed.serviceEntryId ?? null } };
    },
  },
  "POST app/api/presses/[pressId]/tag-outs/route.ts": {
    valid: () => fromZod(tagOutReasonSchema),
    parse: (body) => tagOutReasonSchema.parse(body),
    stored: async ({ actor, call, response, parsed }) => ({ actual: (await listPressTagOuts(actor, call.params!.pressId!)).find((t) => t.id === response.id), expected: parsed }),
  },
  "POST app/api/tag-outs/[tagOutId]/clear/route.ts": {
    valid: () => fromZod(tagOutReasonSchema),
    parse: (body) => tagOutReasonSchema.parse(body),
    stored: async ({ call, response, parsed }) => {
      const [row] = await db.select().from(pressTagOuts).where(and(eq(pressTagOuts.id, call.params!.tagOutId!), eq(pressTagOuts.pressId, response.pressId as string)));
      return { actual: row, expected: { clearReason: parsed.reason } };
    },
  },
  "POST app/api/presses/[pressId]/service-log/route.ts": {
    valid: () => serviceEntryArb,
    parse: (body) => serviceEntryInputSchema.parse(body),
    stored: async ({ actor, response, parsed }) => ({ actual: await getServiceEntry(actor, response.id as string), expected: parsed }),
  },
  "PATCH app/api/service-log/[entryId]/route.ts": {
    valid: () => serviceEntryPatchArb,
    parse: (body) => serviceEntryPatchSchema.parse(body),
    stored: async ({ actor, call, parsed }) => ({ actual: await getServiceEntry(actor, call.params!.entryId!), expected: parsed }),
  },
  "POST app/api/presses/[pressId]/service-plan/route.ts": {
    valid: () => fc.oneof(fromZod(serviceTaskInputSchema), fc.constant({ startingPlan: true })),
    // A plan holds at most 40 tasks: a fresh press each time, so a success stays possible.
    call: onFreshPress("/service-plan"),
    parse: (body) => parsePlanPost(body),
    stored: async ({ actor, call, response, parsed }) => {
      const { tasks } = await getServicePlan(actor, call.params!.pressId!);
      if ("startingPlan" in parsed) return { actual: tasks.length > 0 && tasks.every((t) => t.fromStartingPlan), expected: true };
      return { actual: tasks.find((t) => t.id === response.id), expected: parsed };
    },
  },
  "POST app/api/inspection-templates/route.ts": {
    valid: () => fromZod(templateInputSchema),
    parse: (body) => templateInputSchema.parse(body),
    stored: async ({ actor, response, parsed }) => ({ actual: await getTemplate(actor, response.id as string), expected: parsed }),
  },
  "PUT app/api/inspection-templates/[templateId]/route.ts": {
    valid: () => fromZod(templateInputSchema),
    parse: (body) => templateInputSchema.parse(body),
    stored: async ({ actor, call, parsed }) => ({ actual: await getTemplate(actor, call.params!.templateId!), expected: parsed }),
  },
  "POST app/api/presses/[pressId]/inspections/route.ts": {
    valid: (s) => fc.oneof(fc.constant({ templateId: s.monthlyTemplateId }), fromZod(startInspectionSchema)),
    parse: (body) => startInspectionSchema.parse(body),
    stored: async ({ actor, response, parsed }) => ({ actual: await getInspection(actor, response.id as string), expected: parsed }),
  },
  "PATCH app/api/inspections/[inspectionId]/route.ts": {
    valid: (s) => {
      const answer = fromZod(answerPatchSchema.shape.answers.element).map((a) => ({ ...(a as Json), opKey: op() }) as unknown as Json & { itemKey: string });
      const keys = s.monthlyItemKeys;
      // A failed item needs a note; most answers are on items the checklist has.
      const onItem = fc.tuple(answer, fc.constantFrom(...keys)).map(([a, itemKey]) => ({ ...a, itemKey, ...(a.outcome === "fail" && !a.note ? { note: "Seeping at the fitting" } : {}) }));
      return fc.record({ answers: fc.uniqueArray(fc.oneof({ weight: 6, arbitrary: onItem }, { weight: 1, arbitrary: answer }), { minLength: 1, maxLength: 5, selector: (a) => a.itemKey }) });
    },
    parse: (body) => answerPatchSchema.parse(body),
    stored: async ({ actor, call, parsed }) => {
      const view = await getInspection(actor, call.params!.inspectionId!);
      const answers = parsed.answers as { itemKey: string; outcome: string | null; note?: string | null }[];
      const byKey = new Map(view.items.map((i) => [i.key, i]));
      return {
        actual: answers.map((a) => byKey.get(a.itemKey)),
        expected: answers.map((a) => ({ key: a.itemKey, outcome: a.outcome, ...(a.note !== undefined ? { note: a.note } : {}) })),
      };
    },
  },
  "POST app/api/inspections/[inspectionId]/sign/route.ts": {
    valid: () => fc.constant({}),
    parse: (body) => signInspectionSchema.parse(body),
    stored: async ({ actor, call }) => ({ actual: (await getInspection(actor, call.params!.inspectionId!)).signedAt !== null, expected: true }),
  },
};

/** Mutating routes that read no body at all (bodies.test.ts checks that their files never read one). */
export const NO_BODY: Record<string, string> = {
  "POST app/api/auth/sign-out/route.ts": "ends the cookie's session",
  "POST app/api/jobs/reminders/route.ts": "the scheduler's trigger; the secret is a header",
};

/**
 * MariaDB reads a number sent as a decimal literal into a DOUBLE column with up to an ulp of
 * rounding (9999.999999999969 comes back …967): equal to 12 significant digits is equal.
 */
function sameDouble(expected: unknown, actual: unknown): boolean {
  return typeof expected === "number" && typeof actual === "number" && Math.abs(expected - actual) <= 1e-12 * Math.max(Math.abs(expected), Math.abs(actual));
}

/** Differences between what was stored and what was expected: every key the expectation names, recursively. */
export function differences(expected: unknown, actual: unknown, at = "stored"): string[] {
  if (expected === undefined) return [];
  if (expected instanceof Date || actual instanceof Date) {
    const e = expected instanceof Date ? expected.getTime() : Date.parse(String(expected));
    const a = actual instanceof Date ? actual.getTime() : Date.parse(String(actual));
    return e === a ? [] : [`${at}: expected ${JSON.stringify(expected)}, got ${JSON.stringify(actual)}`];
  }
  if (Array.isArray(expected)) {
    if (!Array.isArray(actual) || actual.length !== expected.length) return [`${at}: expected ${JSON.stringify(expected)}, got ${JSON.stringify(actual)}`];
    return expected.flatMap((e, i) => differences(e, actual[i], `${at}[${i}]`));
  }
  if (expected !== null && typeof expected === "object") {
    if (actual === null || typeof actual !== "object") return [`${at}: expected an object, got ${JSON.stringify(actual)}`];
    return Object.keys(expected).flatMap((k) => differences((expected as Json)[k], (actual as Json)[k], `${at}.${k}`));
  }
  return Object.is(expected, actual) || (expected === 0 && actual === 0) || sameDouble(expected, actual) ? [] : [`${at}: expected ${JSON.stringify(expected)}, got ${JSON.stringify(actual)}`];
}
