import type { Metadata } from "next";
import { forbidden } from "next/navigation";
import { PressForm } from "@/components/press/press-form";
import { Card, PageTitle } from "@/components/ui/card";
import { orPageError, requireShopContext } from "@/lib/auth/current";
import { canEditPress } from "@/lib/auth/permissions";
import { getPress } from "@/lib/data/presses";
import { displayValue } from "@/lib/press/form-values";
import { PRESS_QUANTITY_FIELDS } from "@/lib/press/press-form";
import { updatePressAction } from "../../actions";

export const metadata: Metadata = { title: "Edit press" };

export default async function EditPressPage({ params }: { params: Promise<{ pressId: string }> }) {
  const { pressId } = await params;
  const { user } = await requireShopContext();
  const press = await orPageError(getPress({ userId: user.id }, pressId));
  if (!canEditPress(press.role)) forbidden();
  const initial: Record<string, string> = {
    name: press.name,
    frameType: press.frameType,
    lifecycle: press.lifecycle,
    location: press.location ?? "",
    notes: press.notes ?? "",
  };
  for (const f of PRESS_QUANTITY_FIELDS) initial[f.name] = displayValue(press[f.name as keyof typeof press] as number | null, f.quantity, user.unitSystem);
  return (
    <>
      <PageTitle title={`Edit ${press.name}`} subtitle={press.lifecycle === "retired" ? "This press is retired; its record is closed." : "Retiring a press is final."} />
      <Card>
        <PressForm action={updatePressAction.bind(null, pressId)} initial={initial} units={user.unitSystem} submitLabel="Save changes" />
      </Card>
    </>
  );
}
