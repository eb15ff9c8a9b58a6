import type { Metadata } from "next";
import { forbidden } from "next/navigation";
import { ServiceEntryForm } from "@/components/service/service-entry-form";
import { SafetyCautions } from "@/components/sizing/safety-cautions";
import { Card, PageTitle } from "@/components/ui/card";
import { orPageError, requireShopContext } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { listComponents } from "@/lib/data/components";
import { getPress } from "@/lib/data/presses";
import { getServicePlan } from "@/lib/data/service-plan";
import { logServiceAction } from "../actions";

export const metadata: Metadata = { title: "Log service" };

export default async function NewServiceEntryPage({ params }: { params: Promise<{ pressId: string }> }) {
  const { pressId } = await params;
  const { user } = await requireShopContext();
  const actor = { userId: user.id };
  const press = await orPageError(getPress(actor, pressId));
  if (!can(press.role, "logService") || press.lifecycle === "retired") forbidden();
  const [parts, plan] = await Promise.all([listComponents(actor, pressId), getServicePlan(actor, pressId)]);
  return (
    <>
      <PageTitle title="Log service" subtitle={press.name} />
      <div className="flex flex-col gap-4">
        <Card>
          <ServiceEntryForm
            action={logServiceAction.bind(null, pressId)}
            units={user.unitSystem}
            currency={press.currency}
            today={plan.today}
            currentHours={press.hourMeter}
            hoses={parts.filter((c) => c.kind === "hose").map((c) => ({ id: c.id, label: c.label }))}
          />
        </Card>
        <SafetyCautions compact />
      </div>
    </>
  );
}
