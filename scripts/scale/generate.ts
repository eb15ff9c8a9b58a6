/**
 * The scale data set, generated deterministically: the same seed, factor and anchor give the same
 * rows, byte for byte. Rows are keyed by database column name so `insert.ts` can write them in
 * multi-row INSERTs without the app's per-row data functions. Everything is invented.
 *
 * Generated one shop at a time (`generateShop`) so memory stays small; each shop has its own PRNG
 * stream derived from the seed, so shops do not depend on each other.
 */
import { encodeBase32LowerCaseNoPadding } from "@oslojs/encoding";
import { uniformInt } from "pure-rand/distribution/uniformInt";
import { xoroshiro128plus } from "pure-rand/generator/xoroshiro128plus";
import type { RandomGenerator } from "pure-rand/types/RandomGenerator";
import { DEMO_PARTS } from "../../db/demo-parts";
import type { ServiceKind } from "../../db/schema/service";
import { canonicalRecord, chainLink, GENESIS_LINK, type SignedRecord } from "../../lib/inspections/chain";
import { DEFAULT_TEMPLATES } from "../../lib/inspections/defaults";
import { STARTING_PLAN } from "../../lib/service/starting-plan";

export type Row = Record<string, unknown>;

/** Tables in the order they are written (answers before their signed inspections: see insert.ts). */
export const TABLE_ORDER = [
  "shops",
  "users",
  "memberships",
  "presses",
  "components",
  "hour_meter_readings",
  "service_entries",
  "service_tasks",
  "inspection_templates",
  "inspection_answers",
  "inspections",
  "bookings",
] as const;
export type TableName = (typeof TABLE_ORDER)[number];
export type ShopRows = Record<TableName, Row[]>;

export type ScaleConfig = {
  shops: number;
  presses: number;
  serviceEntries: number;
  inspections: number;
  bookings: number;
  /** Hour-meter readings of every ordinary press. */
  readingsPerPress: number;
  /** The one press in shop 1 with years of history (issue 13's growth target). */
  heavy: { parts: number; readings: number; serviceEntries: number; inspections: number };
};

const FULL: ScaleConfig = {
  shops: 50,
  presses: 500,
  serviceEntries: 100_000,
  inspections: 20_000,
  bookings: 50_000,
  readingsPerPress: 20,
  heavy: { parts: 60, readings: 5_000, serviceEntries: 5_000, inspections: 500 },
};

/** The full data set times `factor` (SCALE_FACTOR); at least one shop and two presses, so the heavy press is never alone. */
export function scaleConfig(factor = 1): ScaleConfig {
  if (!(factor > 0 && factor <= 1)) throw new RangeError(`SCALE_FACTOR must be in (0, 1], got ${factor}`);
  const scaled = (n: number, min: number) => Math.max(min, Math.round(n * factor));
  const shops = scaled(FULL.shops, 1);
  const heavy = { parts: FULL.heavy.parts, readings: scaled(FULL.heavy.readings, 2), serviceEntries: scaled(FULL.heavy.serviceEntries, 1), inspections: scaled(FULL.heavy.inspections, 1) };
  return {
    shops,
    presses: scaled(FULL.presses, 2 * shops),
    serviceEntries: scaled(FULL.serviceEntries, heavy.serviceEntries + 1),
    inspections: scaled(FULL.inspections, heavy.inspections + 1),
    bookings: scaled(FULL.bookings, 1),
    readingsPerPress: scaled(FULL.readingsPerPress, 2),
    heavy,
  };
}

/** The one password of every scale account (hashed once by the seed script). */
export const SCALE_PASSWORD = "scale-bench-password-2026";
export const SHOP_ROLES = ["manager", "inspector", "member1", "member2", "member3"] as const;

export function scaleEmail(shopIndex: number, role: (typeof SHOP_ROLES)[number]): string {
  return `shop${String(shopIndex + 1).padStart(2, "0")}.${role}@scale.presswright.test`;
}

const DAY_MS = 86_400_000;
/** How far back every press's history starts. */
const HISTORY_DAYS = 5 * 365;
/** Bookings spread over this window around the anchor. */
const BOOKING_WINDOW_DAYS = { before: 60, after: 60 };

const ZONES = ["Europe/Berlin", "America/Chicago", "Europe/London", "Australia/Melbourne", "America/New_York", "UTC"];
const CURRENCIES = ["EUR", "USD", "GBP", "AUD", "USD", "EUR"];
const SHOP_WORDS = ["Anvil", "Forge", "Hammer", "Ember", "Quench", "Billet", "Tong", "Slag", "Crucible", "Rivet"];
const PEOPLE = ["Ada", "Bram", "Cleo", "Dev", "Edda", "Finn", "Gus", "Hana", "Ivo", "Juno", "Kai", "Lena", "Milo", "Nia", "Otto", "Pia"];
const FRAMES = ["h-frame", "c-frame", "four-post"] as const;
const ENTRY_KINDS: ServiceKind[] = ["filter-changed", "oil-changed", "oil-topped-up", "oil-sample", "relief-checked", "leak-fixed", "weld-repaired", "die-changed", "other"];
const PART_SET = DEMO_PARTS["Bay 1 H-frame"]!;

/** A small deterministic stream: ids, integers, picks. */
export class Stream {
  private rng: RandomGenerator;
  constructor(seed: number) {
    this.rng = xoroshiro128plus(seed | 0);
  }
  int(from: number, to: number): number {
    return uniformInt(this.rng, from, to);
  }
  pick<T>(items: readonly T[]): T {
    return items[this.int(0, items.length - 1)]!;
  }
  chance(percent: number): boolean {
    return this.int(1, 100) <= percent;
  }
  /** Same shape as lib/ids.ts newId(): 15 bytes in 24 lowercase base32 characters. */
  id(): string {
    const bytes = new Uint8Array(16);
    const view = new DataView(bytes.buffer);
    for (let i = 0; i < 4; i++) view.setInt32(i * 4, this.rng.next());
    return encodeBase32LowerCaseNoPadding(bytes.subarray(0, 15));
  }
}

/** How many of `total` items fall to item `index` of `count`, spread as evenly as whole numbers allow. */
export function share(total: number, count: number, index: number): number {
  return Math.floor(total / count) + (index < total % count ? 1 : 0);
}

const isoDate = (ms: number) => new Date(ms).toISOString().slice(0, 10);

export type ShopContext = { seed: number; config: ScaleConfig; anchor: Date; passwordHash: string; chainKey: string };

/** Press `p` of the whole set (0-based, shop-major); the heavy press is press 0 of shop 0. */
function pressPlan(config: ScaleConfig, p: number) {
  if (p === 0) return { heavy: true, readings: config.heavy.readings, entries: config.heavy.serviceEntries, inspections: config.heavy.inspections, parts: config.heavy.parts };
  const others = config.presses - 1;
  return {
    heavy: false,
    readings: config.readingsPerPress,
    entries: share(config.serviceEntries - config.heavy.serviceEntries, others, p - 1),
    inspections: share(config.inspections - config.heavy.inspections, others, p - 1),
    parts: PART_SET.length,
  };
}

function shopStream(seed: number, shopIndex: number): Stream {
  return new Stream((seed * 1_000_003 + shopIndex * 7_919) | 0);
}

/** A shop's id is the first value of its stream, so another shop can refer to it. */
function shopIdOf(seed: number, shopIndex: number): string {
  return shopStream(seed, shopIndex).id();
}

/** Every row of shop `shopIndex` (0-based). */
export function generateShop(ctx: ShopContext, shopIndex: number): ShopRows {
  const { config, anchor } = ctx;
  const s = shopStream(ctx.seed, shopIndex);
  const rows = Object.fromEntries(TABLE_ORDER.map((t) => [t, [] as Row[]])) as ShopRows;
  const now = anchor.getTime();
  const historyStart = now - HISTORY_DAYS * DAY_MS;
  const shopId = s.id();
  const zone = ZONES[shopIndex % ZONES.length]!;
  rows.shops.push({ id: shopId, name: `${s.pick(SHOP_WORDS)} ${s.pick(SHOP_WORDS)} Works ${shopIndex + 1}`, time_zone: zone, currency: CURRENCIES[shopIndex % CURRENCIES.length], personal: false, opening_hours: null, created_at: new Date(historyStart) });

  const people = SHOP_ROLES.map((role) => ({ role, id: s.id(), name: `${s.pick(PEOPLE)} ${role === "manager" ? "Manager" : role === "inspector" ? "Inspector" : "Member"} ${shopIndex + 1}` }));
  for (const person of people) {
    rows.users.push({ id: person.id, email: scaleEmail(shopIndex, person.role), display_name: person.name, password_hash: ctx.passwordHash, unit_system: "metric", active_shop_id: shopId, created_at: new Date(historyStart) });
    rows.memberships.push({ shop_id: shopId, user_id: person.id, role: person.role.startsWith("member") ? "member" : person.role, created_at: new Date(historyStart) });
  }
  // Each manager is also a member of the next shop, so the shell's shop switcher has a choice.
  if (config.shops > 1) rows.memberships.push({ shop_id: shopIdOf(ctx.seed, (shopIndex + 1) % config.shops), user_id: people[0]!.id, role: "member", created_at: new Date(historyStart) });
  const [manager, inspector, ...members] = people as [(typeof people)[0], (typeof people)[0], ...(typeof people)[0][]];
  const signers = [manager, inspector, inspector];

  const templates = DEFAULT_TEMPLATES.map((t) => ({ id: s.id(), ...t }));
  for (const t of templates) rows.inspection_templates.push({ id: t.id, shop_id: shopId, name: t.name, cadence: t.cadence, signer_role: t.signerRole, items: JSON.stringify(t.items), archived: false, created_at: new Date(historyStart), updated_at: new Date(historyStart) });

  const firstPress = Math.round((shopIndex * config.presses) / config.shops);
  const pressCount = Math.round(((shopIndex + 1) * config.presses) / config.shops) - firstPress;
  for (let i = 0; i < pressCount; i++) {
    const p = firstPress + i;
    const plan = pressPlan(config, p);
    const pressId = s.id();
    const frame = s.pick(FRAMES);

    // Hour meter: readings from the start of history to a day before the anchor, never backwards.
    let hours = 0;
    const step = (now - DAY_MS - historyStart) / plan.readings;
    const readingAt: { at: number; hours: number }[] = [];
    for (let r = 0; r < plan.readings; r++) {
      hours = Math.round((hours + s.int(5, 40) / 10) * 10) / 10;
      const at = Math.round(historyStart + (r + 1) * step);
      readingAt.push({ at, hours });
      rows.hour_meter_readings.push({ press_id: pressId, hours, read_at: new Date(at), recorded_by: s.pick(people).id, note: null, kind: "reading", voided_by: null });
    }
    const hoursAt = (at: number) => readingAt[Math.min(readingAt.length - 1, Math.max(0, Math.floor((at - historyStart) / step) - 1))]!.hours;

    rows.presses.push({
      id: pressId,
      shop_id: shopId,
      name: plan.heavy ? "Heavy press (years of history)" : `${frame === "h-frame" ? "H-frame" : frame === "c-frame" ? "C-frame" : "Four-post"} ${shopIndex + 1}-${i + 1}`,
      frame_type: frame,
      lifecycle: "in-service",
      rated_force_kn: s.int(100, 1500),
      daylight_mm: s.int(300, 900),
      stroke_mm: s.int(150, 400),
      bed_width_mm: s.int(300, 800),
      bed_depth_mm: s.int(250, 600),
      working_pressure_bar: 200,
      relief_pressure_bar: 210,
      hour_meter: hours,
      location: `Bay ${s.int(1, 6)}`,
      notes: null,
      sizing_input: null,
      status_token: null,
      created_at: new Date(historyStart),
      updated_at: new Date(historyStart),
    });

    for (let c = 0; c < plan.parts; c++) {
      const part = PART_SET[c % PART_SET.length]!;
      const set = Math.floor(c / PART_SET.length);
      rows.components.push({ id: s.id(), press_id: pressId, kind: part.spec.kind, label: set === 0 ? part.label : `${part.label} (set ${set + 1})`, spec: JSON.stringify(part.spec), maker: part.maker ?? null, part_number: part.partNumber ?? null, supplier: part.supplier ?? null, cost_cents: part.costCents ?? null, purchased: true, installed_on: isoDate(historyStart), removed_on: null, removal_reason: null, replaced_by_id: null, created_at: new Date(historyStart), updated_at: new Date(historyStart) });
    }

    // Service log: evenly through the history, oldest first.
    const lastOfKind = new Map<ServiceKind, { on: string; hours: number; id: string }>();
    for (let e = 0; e < plan.entries; e++) {
      const at = historyStart + Math.round(((e + 1) * (now - DAY_MS - historyStart)) / (plan.entries + 1));
      const kind = s.pick(ENTRY_KINDS);
      const id = s.id();
      const entryHours = hoursAt(at);
      const performedBy = s.pick(signers).id;
      rows.service_entries.push({
        id,
        press_id: pressId,
        kind,
        performed_on: isoDate(at),
        hours: entryHours,
        parts: JSON.stringify(kind === "filter-changed" ? [{ description: "Return filter element RF-10-160", quantity: 1 }] : []),
        component_id: null,
        installed_component_id: null,
        cost_cents: s.chance(60) ? s.int(500, 40_000) : null,
        iso4406: kind === "oil-sample" ? `${s.int(15, 20)}/${s.int(13, 17)}/${s.int(10, 14)}` : null,
        relief_found_bar: kind === "relief-checked" ? s.int(200, 220) : null,
        relief_set_bar: kind === "relief-checked" ? 210 : null,
        notes: s.chance(30) ? `Routine work, entry ${e + 1}.` : null,
        performed_by: performedBy,
        created_at: new Date(at),
        updated_at: new Date(at),
      });
      lastOfKind.set(kind, { on: isoDate(at), hours: entryHours, id });
    }
    for (const task of STARTING_PLAN) {
      const last = lastOfKind.get(task.kind);
      rows.service_tasks.push({ id: s.id(), press_id: pressId, title: task.title, kind: task.kind, interval_days: task.intervalDays, interval_hours: task.intervalHours, last_done_on: last?.on ?? isoDate(historyStart), last_done_hours: last?.hours ?? 0, last_entry_id: last?.id ?? null, from_starting_plan: true, created_at: new Date(historyStart) });
    }

    // Signed inspections: a valid HMAC chain per press, the newest a few days before the anchor.
    let previous = { seq: 0, hash: GENESIS_LINK };
    for (let n = 0; n < plan.inspections; n++) {
      const template = templates[n % templates.length]!;
      const signedAt = new Date(historyStart + Math.round(((n + 1) * (now - 2 * DAY_MS - historyStart)) / plan.inspections));
      const answeredAt = new Date(signedAt.getTime() - 20 * 60_000);
      const signer = template.signerRole === "member" ? s.pick(members) : s.pick(signers);
      const record: SignedRecord = {
        id: s.id(),
        pressId,
        templateName: template.name,
        cadence: template.cadence,
        signerRole: template.signerRole,
        result: "pass",
        signedBy: signer.id,
        signerName: signer.name,
        signedAt,
        chainSeq: previous.seq + 1,
        items: template.items.map((item) => {
          const na = !item.critical && s.chance(10);
          return { ...item, outcome: na ? "na" : "pass", note: na ? "Not fitted at the time." : null, answeredBy: signer.id, answeredAt };
        }),
      };
      const chainHash = chainLink(ctx.chainKey, canonicalRecord(record), previous.hash);
      record.items.forEach((item, position) => {
        rows.inspection_answers.push({ id: s.id(), inspection_id: record.id, item_key: item.key, position, outcome: item.outcome, note: item.note, answered_by: signer.id, answered_at: answeredAt });
      });
      rows.inspections.push({ id: record.id, press_id: pressId, template_id: template.id, template_name: template.name, cadence: template.cadence, signer_role: template.signerRole, items: JSON.stringify(template.items), started_by: signer.id, started_at: answeredAt, result: "pass", signed_by: signer.id, signer_name: signer.name, signed_at: signedAt, chain_seq: record.chainSeq, prev_hash: previous.hash, chain_hash: chainHash });
      previous = { seq: record.chainSeq, hash: chainHash };
    }

    // Bookings: back to back or with gaps, never overlapping (the table refuses overlaps anyway).
    let cursor = now - BOOKING_WINDOW_DAYS.before * DAY_MS;
    const bookingCount = share(config.bookings, config.presses, p);
    const slot = ((BOOKING_WINDOW_DAYS.before + BOOKING_WINDOW_DAYS.after) * DAY_MS) / Math.max(1, bookingCount);
    for (let b = 0; b < bookingCount; b++) {
      const startsAt = cursor + s.int(0, Math.floor(slot / 2 / 60_000)) * 60_000;
      const endsAt = startsAt + s.int(2, 8) * 30 * 60_000;
      rows.bookings.push({ id: s.id(), press_id: pressId, user_id: s.pick(people).id, starts_at: new Date(startsAt), ends_at: new Date(endsAt), created_at: new Date(Math.min(startsAt, now) - DAY_MS) });
      cursor = Math.max(endsAt, cursor + slot);
    }
  }
  return rows;
}
