// The two shops the authorization matrix runs in, and fresh objects for cells that change state.
// Objects are made through the data layer as the shop's manager (or inserted directly where the
// data layer needs an outside service, e.g. a stored photo), so every cell starts from a known state.
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { memberships, photos, presses, shops } from "@/db/schema";
import { createSession } from "@/lib/auth/session";
import { createBooking } from "@/lib/data/bookings";
import { createComponent } from "@/lib/data/components";
import { recordHourMeter } from "@/lib/data/press-edits";
import { createTemplate, listTemplates } from "@/lib/data/inspection-templates";
import { getInspection, startInspection, updateAnswers } from "@/lib/data/inspections";
import { tagOutPressByHand } from "@/lib/data/press-tag-outs";
import { reportProblem } from "@/lib/data/problems";
import { createServiceEntry } from "@/lib/data/service-log";
import { newId } from "@/lib/ids";
import { componentInputSchema } from "@/lib/validation/press";
import { makeUser } from "../helpers";

export const ROLES = ["manager", "inspector", "member"] as const;
export type ShopRole = (typeof ROLES)[number];
type User = Awaited<ReturnType<typeof makeUser>>;

export type Shop = {
  shopId: string;
  /** An in-service press shared by cells that do not change its state. */
  pressId: string;
  statusToken: string;
  monthlyTemplateId: string;
  users: Record<ShopRole, User>;
  cookies: Record<ShopRole, string>;
};

let slot = 0;
let opCounter = 0;

async function makeShop(label: string): Promise<Shop> {
  const [manager, inspector, member] = await Promise.all([makeUser(), makeUser(), makeUser()]);
  const shopId = newId();
  await db.insert(shops).values({ id: shopId, name: `Matrix shop ${label}`, timeZone: "Europe/London" });
  await db.insert(memberships).values([
    { shopId, userId: manager.userId, role: "manager" },
    { shopId, userId: inspector.userId, role: "inspector" },
    { shopId, userId: member.userId, role: "member" },
  ]);
  const users = { manager, inspector, member };
  const shop: Shop = { shopId, pressId: "", statusToken: newId(), monthlyTemplateId: "", users, cookies: { manager: "", inspector: "", member: "" } };
  shop.pressId = await freshPress(shop);
  await db.update(presses).set({ statusToken: shop.statusToken }).where(eq(presses.id, shop.pressId));
  for (const role of ROLES) shop.cookies[role] = `session=${(await createSession(users[role].userId)).token}`;
  const templates = await listTemplates({ userId: manager.userId }, shopId);
  shop.monthlyTemplateId = templates.find((t) => t.cadence === "monthly")!.id;
  return shop;
}

/** Shop A and shop B, each with a manager, an inspector and a member (nobody in both). */
export async function makeWorld(): Promise<{ a: Shop; b: Shop }> {
  const [a, b] = await Promise.all([makeShop("A"), makeShop("B")]);
  return { a, b };
}

const asManager = (shop: Shop) => ({ userId: shop.users.manager.userId });

export async function freshPress(shop: Shop): Promise<string> {
  const id = newId();
  await db.insert(presses).values({ id, shopId: shop.shopId, name: `Matrix press ${id.slice(0, 4)}`, frameType: "h-frame", lifecycle: "in-service" });
  return id;
}

/** A whole future hour that no other cell books (one press is shared by all booking cells). */
export function nextSlot(): { startsAt: string; endsAt: string } {
  slot += 1;
  const start = Math.ceil(Date.now() / 3_600_000) * 3_600_000 + (24 + slot) * 3_600_000;
  return { startsAt: new Date(start).toISOString(), endsAt: new Date(start + 3_600_000).toISOString() };
}

/** A booking held by the shop's member (so the manager cancels someone else's, the member their own). */
export async function freshBooking(shop: Shop): Promise<string> {
  const slotTimes = nextSlot();
  const { id } = await createBooking({ userId: shop.users.member.userId }, shop.pressId, { startsAt: new Date(slotTimes.startsAt), endsAt: new Date(slotTimes.endsAt) });
  return id;
}

export const GAUGE = { kind: "gauge", label: "Matrix gauge", spec: { rangeBar: 250 } };

export async function freshComponent(shop: Shop): Promise<string> {
  return (await createComponent(asManager(shop), shop.pressId, componentInputSchema.parse(GAUGE))).id;
}

export async function freshServiceEntry(shop: Shop): Promise<string> {
  return (await createServiceEntry(asManager(shop), shop.pressId, { kind: "other", performedOn: "2026-01-05", parts: [], notes: "Matrix entry" })).id;
}

export async function freshProblem(shop: Shop): Promise<string> {
  return (await reportProblem(asManager(shop), shop.pressId, { description: "Matrix problem", severity: "low", stopUse: false })).id;
}

/** A hand tag-out on a press of its own, so tagging out never blocks the shared press's bookings. */
export async function freshTagOut(shop: Shop): Promise<string> {
  return (await tagOutPressByHand(asManager(shop), await freshPress(shop), "Matrix tag-out")).id;
}

export async function freshTemplate(shop: Shop): Promise<string> {
  return (await createTemplate(asManager(shop), shop.shopId, TEMPLATE)).id;
}

export const TEMPLATE = {
  name: "Matrix checklist",
  cadence: "monthly" as const,
  items: [{ area: "hydraulics" as const, text: "Relief valve holds its setting", guidance: "", critical: false, photoOnFail: false, lockout: false }],
};

/** Answer keys are idempotency keys kept in the database: unique across runs, not only within one. */
const runTag = Date.now().toString(36);
export const op = (): string => `matrix-${runTag}-${(opCounter += 1)}`;

/** A monthly inspection (inspector signs) on a press of its own; `answered` fills every item with pass. */
export async function freshInspection(shop: Shop, answered = false): Promise<string> {
  const actor = asManager(shop);
  const { id } = await startInspection(actor, await freshPress(shop), shop.monthlyTemplateId);
  if (answered) {
    const view = await getInspection(actor, id);
    await updateAnswers(actor, id, { answers: view.items.map((i) => ({ opKey: op(), itemKey: i.key, outcome: "pass" as const, note: null })) });
  }
  return id;
}

/** A stored photo uploaded by the shop's member (storage calls are stubbed in the test file). */
export async function freshPhoto(shop: Shop): Promise<string> {
  const id = newId();
  await db.insert(photos).values({
    id, pressId: shop.pressId, kind: "weld", caption: "Matrix photo", uploadedBy: shop.users.member.userId,
    fileKey: `matrix-${id}`, fileUrl: "http://127.0.0.1:9/f", width: 10, height: 10, bytes: 100,
    thumbKey: `matrix-${id}-t`, thumbUrl: "http://127.0.0.1:9/t", thumbWidth: 5, thumbHeight: 5, thumbBytes: 50,
  });
  return id;
}

/** A press with one reading of 10 h, for corrections. */
export async function pressWithReading(shop: Shop): Promise<string> {
  const pressId = await freshPress(shop);
  await recordHourMeter(asManager(shop), pressId, { hours: 10 });
  return pressId;
}
