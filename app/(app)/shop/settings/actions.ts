"use server";

import { revalidatePath } from "next/cache";
import { refusalState } from "@/lib/action-refusal";
import { echoValues, type ActionState } from "@/lib/action-state";
import { assertSameOriginAction } from "@/lib/auth/action-guard";
import { requireShopContext } from "@/lib/auth/current";
import { ForbiddenError, NotFoundError } from "@/lib/auth/permissions";
import { changeMemberRole, LastManagerError, removeMember, updateOpeningHours, updateShop } from "@/lib/data/shops";
import { memberRoleSchema, openingHoursFromForm, shopSettingsSchema } from "@/lib/validation/shop";
import { fieldErrorsOf } from "@/lib/validation/field-errors";
import { revalidateSignedInPages } from "@/lib/revalidate";

export async function updateShopAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const { user, shop } = await requireShopContext();
  const values = echoValues(form);
  const parsed = shopSettingsSchema.safeParse({ name: form.get("name"), timeZone: form.get("timeZone") });
  if (!parsed.success) return { ok: false, fieldErrors: fieldErrorsOf(parsed.error.issues), values };
  try {
    await updateShop({ userId: user.id }, shop.id, parsed.data);
  } catch (error) {
    if (error instanceof ForbiddenError) return { ok: false, message: "Only a manager can change shop settings.", values };
    throw error;
  }
  revalidateSignedInPages();
  return { ok: true, message: "Shop settings saved.", values };
}

export async function changeRoleAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const { user, shop } = await requireShopContext();
  const parsed = memberRoleSchema.safeParse({ userId: form.get("userId"), role: form.get("role") });
  if (!parsed.success) return { ok: false, message: "Choose a valid role." };
  try {
    await changeMemberRole({ userId: user.id }, shop.id, parsed.data.userId, parsed.data.role);
  } catch (error) {
    if (error instanceof LastManagerError || error instanceof ForbiddenError || error instanceof NotFoundError) {
      return { ok: false, message: error.message };
    }
    throw error;
  }
  revalidatePath("/shop");
  return { ok: true, message: "Role changed." };
}

export async function updateOpeningHoursAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const { user, shop } = await requireShopContext();
  const values = echoValues(form);
  const parsed = openingHoursFromForm(values);
  if ("fieldErrors" in parsed) return { ok: false, message: "Please fix the marked days.", fieldErrors: parsed.fieldErrors, values };
  try {
    await updateOpeningHours({ userId: user.id }, shop.id, parsed.hours);
  } catch (error) {
    return refusalState(error, values, "Only a manager can change the opening hours.");
  }
  revalidatePath("/shop", "layout");
  return { ok: true, message: parsed.hours ? "Opening hours saved. New bookings must fit inside them." : "Bookings may now be made at any time.", values };
}

export async function removeMemberAction(userId: string, _prev: ActionState): Promise<ActionState> {
  await assertSameOriginAction();
  const { user, shop } = await requireShopContext();
  try {
    await removeMember({ userId: user.id }, shop.id, userId);
  } catch (error) {
    if (error instanceof LastManagerError) return { ok: false, message: error.message };
    return refusalState(error, {}, "Only a manager can remove members.");
  }
  revalidatePath("/shop", "layout");
  return { ok: true, message: "Removed from the shop." };
}
