"use server";

import { revalidatePath } from "next/cache";
import { refusalState } from "@/lib/action-refusal";
import { echoValues, type ActionState } from "@/lib/action-state";
import { assertSameOriginAction } from "@/lib/auth/action-guard";
import { requireShopContext } from "@/lib/auth/current";
import { cancelBooking, createBooking, getPressTimeZone } from "@/lib/data/bookings";
import { ID_PATTERN } from "@/lib/ids";
import { parseLocal } from "@/lib/time-zone";

/** Books a press from a form: date, from and to are wall-clock times in the shop's zone. */
export async function bookPressAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  await assertSameOriginAction();
  const { user } = await requireShopContext();
  const values = echoValues(form);
  const { pressId = "", date = "", from = "", to = "" } = values;
  if (!ID_PATTERN.test(pressId)) return { ok: false, fieldErrors: { pressId: ["Choose a press."] }, values };
  const actor = { userId: user.id };
  try {
    const zone = await getPressTimeZone(actor, pressId);
    const startsAt = parseLocal(date, from, zone);
    const endsAt = parseLocal(date, to, zone);
    if (!startsAt || !endsAt) {
      return { ok: false, message: "Please fix the marked fields.", fieldErrors: { ...(!startsAt ? { from: ["Give a date and a start time."] } : {}), ...(!endsAt ? { to: ["Give an end time."] } : {}) }, values };
    }
    const { warnings } = await createBooking(actor, pressId, { startsAt, endsAt });
    revalidatePath("/bookings");
    const message = `Booked ${date} ${from}–${to}. A confirmation with a calendar file is on its way.`;
    return { ok: true, message: warnings.length ? `${message} Note: ${warnings.join(" ")}` : message, values: { pressId } };
  } catch (error) {
    const state = refusalState(error, values);
    // The data layer names API fields; the form's are "from" and "to".
    if (state.fieldErrors) state.fieldErrors = { from: state.fieldErrors.startsAt, to: state.fieldErrors.endsAt };
    return state;
  }
}

export async function cancelBookingAction(bookingId: string, _prev: ActionState): Promise<ActionState> {
  await assertSameOriginAction();
  const { user } = await requireShopContext();
  try {
    await cancelBooking({ userId: user.id }, bookingId);
  } catch (error) {
    return refusalState(error, {}, "Only the holder or a manager can cancel this booking.");
  }
  revalidatePath("/bookings");
  return { ok: true, message: "Booking cancelled." };
}
