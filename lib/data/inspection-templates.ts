import "server-only";
import { and, asc, count, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { CADENCES, inspectionTemplates, memberships, shops, type Cadence, type SignerRole, type TemplateItem } from "@/db/schema";
import { assertCan, NotFoundError, type Role } from "@/lib/auth/permissions";
import { newId } from "@/lib/ids";
import { DEFAULT_TEMPLATES } from "@/lib/inspections/defaults";
import type { TemplateInput } from "@/lib/validation/inspection";
import type { Actor } from "./actor";
import type { Executor } from "./press-access";

export type TemplateView = { id: string; shopId: string; name: string; cadence: Cadence; signerRole: SignerRole; items: TemplateItem[]; archived: boolean };

const viewColumns = {
  id: inspectionTemplates.id,
  shopId: inspectionTemplates.shopId,
  name: inspectionTemplates.name,
  cadence: inspectionTemplates.cadence,
  signerRole: inspectionTemplates.signerRole,
  items: inspectionTemplates.items,
  archived: inspectionTemplates.archived,
};

/** Pre-use checks may be signed by any member; every other cadence by an inspector (issue 10). */
export function signerRoleFor(cadence: Cadence): SignerRole {
  return cadence === "pre-use" ? "member" : "inspector";
}

/**
 * Gives a shop the default checklists the first time it has none (under a lock on the shop row,
 * so two first visits never double them). No authorization: callers have checked membership.
 */
export async function ensureDefaultTemplates(executor: Executor, shopId: string): Promise<void> {
  const [existing] = await executor.select({ n: count() }).from(inspectionTemplates).where(eq(inspectionTemplates.shopId, shopId));
  if ((existing?.n ?? 0) > 0) return;
  await db.transaction(async (tx) => {
    await tx.select({ id: shops.id }).from(shops).where(eq(shops.id, shopId)).for("update");
    const [again] = await tx.select({ n: count() }).from(inspectionTemplates).where(eq(inspectionTemplates.shopId, shopId));
    if ((again?.n ?? 0) > 0) return;
    await tx.insert(inspectionTemplates).values(DEFAULT_TEMPLATES.map((t) => ({ id: newId(), shopId, ...t, items: t.items })));
  });
}

async function shopRole(executor: Executor, actor: Actor, shopId: string): Promise<Role> {
  const [row] = await executor
    .select({ role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.shopId, shopId), eq(memberships.userId, actor.userId)))
    .limit(1);
  if (!row) throw new NotFoundError("Shop not found");
  return row.role;
}

/** A shop's checklists (defaults created on first use). Authorization: members of the shop. */
export async function listTemplates(actor: Actor, shopId: string, options: { includeArchived?: boolean } = {}): Promise<TemplateView[]> {
  await shopRole(db, actor, shopId);
  await ensureDefaultTemplates(db, shopId);
  const rows = await db
    .select(viewColumns)
    .from(inspectionTemplates)
    .where(and(eq(inspectionTemplates.shopId, shopId), options.includeArchived ? undefined : eq(inspectionTemplates.archived, false)))
    .orderBy(asc(inspectionTemplates.name));
  // Most frequent first: before each use, weekly, monthly, yearly, after a modification.
  return rows.sort((a, b) => CADENCES.indexOf(a.cadence) - CADENCES.indexOf(b.cadence));
}

/** One checklist. Authorization: members of its shop; another shop's is NotFoundError. */
export async function getTemplate(actor: Actor, templateId: string, executor: Executor = db): Promise<TemplateView & { role: Role }> {
  const [row] = await executor.select(viewColumns).from(inspectionTemplates).where(eq(inspectionTemplates.id, templateId)).limit(1);
  if (!row) throw new NotFoundError("Checklist not found");
  return { ...row, role: await shopRole(executor, actor, row.shopId) };
}

/** Item keys stay stable across edits: kept where given, made up for new items. */
function withKeys(items: TemplateInput["items"]): TemplateItem[] {
  const used = new Set(items.flatMap((i) => (i.key ? [i.key] : [])));
  let n = 0;
  return items.map((i) => {
    if (i.key) return { ...i, key: i.key };
    let key: string;
    do key = `item-${++n}`;
    while (used.has(key));
    used.add(key);
    return { ...i, key };
  });
}

/**
 * Changes a checklist. Inspections already started keep their own snapshot, so nothing done
 * changes. Authorization: managers of the template's shop.
 */
export async function updateTemplate(actor: Actor, templateId: string, input: TemplateInput): Promise<void> {
  const template = await getTemplate(actor, templateId);
  assertCan(template.role, "editInspectionTemplates");
  await db
    .update(inspectionTemplates)
    .set({ name: input.name, cadence: input.cadence, signerRole: signerRoleFor(input.cadence), items: withKeys(input.items), updatedAt: new Date() })
    .where(eq(inspectionTemplates.id, templateId));
}

/** A new checklist for a shop. Authorization: managers of that shop. */
export async function createTemplate(actor: Actor, shopId: string, input: TemplateInput): Promise<{ id: string }> {
  assertCan(await shopRole(db, actor, shopId), "editInspectionTemplates");
  const id = newId();
  await db.insert(inspectionTemplates).values({ id, shopId, name: input.name, cadence: input.cadence, signerRole: signerRoleFor(input.cadence), items: withKeys(input.items) });
  return { id };
}

/** Retires a checklist from new runs (done ones keep it by snapshot). Authorization: managers. */
export async function setTemplateArchived(actor: Actor, templateId: string, archived: boolean): Promise<void> {
  const template = await getTemplate(actor, templateId);
  assertCan(template.role, "editInspectionTemplates");
  await db.update(inspectionTemplates).set({ archived, updatedAt: new Date() }).where(eq(inspectionTemplates.id, templateId));
}
