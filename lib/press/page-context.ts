import "server-only";
import { forbidden, notFound } from "next/navigation";
import { orPageError, requireShopContext } from "@/lib/auth/current";
import { canEditPress } from "@/lib/auth/permissions";
import { getComponent, type ComponentRow } from "@/lib/data/components";
import { getPress, type PressDetail } from "@/lib/data/presses";
import type { UnitSystem } from "@/lib/units";

export type EditContext = { press: PressDetail; units: UnitSystem; today: string };

/** For the part-editing pages: the press (404 if foreign; it carries the shop's currency), managers only (403), today's date. */
export async function pressEditContext(pressId: string): Promise<EditContext> {
  const { user } = await requireShopContext();
  const press = await orPageError(getPress({ userId: user.id }, pressId));
  if (!canEditPress(press.role)) forbidden();
  return { press, units: user.unitSystem, today: new Date().toISOString().slice(0, 10) };
}

/** As above, plus one of the press's components (404 when it belongs elsewhere). */
export async function componentEditContext(pressId: string, componentId: string): Promise<EditContext & { component: ComponentRow }> {
  const context = await pressEditContext(pressId);
  const { user } = await requireShopContext();
  const component = await orPageError(getComponent({ userId: user.id }, componentId));
  if (component.pressId !== pressId) notFound();
  return { ...context, component };
}
