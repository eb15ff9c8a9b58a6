import type { Metadata } from "next";
import { RemoveComponentForm } from "@/components/press/remove-component-form";
import { Card, PageTitle } from "@/components/ui/card";
import { componentEditContext } from "@/lib/press/page-context";
import { removeComponentAction } from "../../../actions";

export const metadata: Metadata = { title: "Remove part" };

export default async function RemoveComponentPage({ params }: { params: Promise<{ pressId: string; componentId: string }> }) {
  const { pressId, componentId } = await params;
  const { press, component, today } = await componentEditContext(pressId, componentId);
  return (
    <>
      <PageTitle title={`Remove ${component.label}`} subtitle={press.name} />
      <Card>
        <RemoveComponentForm action={removeComponentAction.bind(null, pressId, componentId)} today={today} canDelete={!component.replacedById} />
      </Card>
    </>
  );
}
