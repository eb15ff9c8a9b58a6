import type { Metadata } from "next";
import { forbidden } from "next/navigation";
import { PressForm } from "@/components/press/press-form";
import { Card, PageTitle } from "@/components/ui/card";
import { requireShopContext } from "@/lib/auth/current";
import { canEditPress } from "@/lib/auth/permissions";
import { createPressAction } from "../actions";

export const metadata: Metadata = { title: "New press" };

export default async function NewPressPage() {
  const { user, shop } = await requireShopContext();
  if (!canEditPress(shop.role)) forbidden();
  return (
    <>
      <PageTitle title="New press" subtitle={`In ${shop.name}. Add its parts on the next page.`} />
      <Card>
        <PressForm action={createPressAction} initial={{}} units={user.unitSystem} submitLabel="Create press" />
      </Card>
    </>
  );
}
