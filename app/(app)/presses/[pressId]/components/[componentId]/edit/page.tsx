import type { Metadata } from "next";
import { ComponentForm } from "@/components/press/component-form";
import { Card, PageTitle } from "@/components/ui/card";
import { componentFormValues } from "@/lib/press/component-form";
import { componentEditContext } from "@/lib/press/page-context";
import { editComponentAction } from "../../../actions";

export const metadata: Metadata = { title: "Edit part" };

export default async function EditComponentPage({ params }: { params: Promise<{ pressId: string; componentId: string }> }) {
  const { pressId, componentId } = await params;
  const { press, component, units, today } = await componentEditContext(pressId, componentId);
  return (
    <>
      <PageTitle title={`Edit ${component.label}`} subtitle={`${press.name} · to record a new part in its place, use Replace instead`} />
      <Card>
        <ComponentForm
          action={editComponentAction.bind(null, pressId, componentId)}
          mode="edit"
          kind={component.kind}
          initial={componentFormValues(component, units)}
          units={units}
          currency={press.currency}
          today={today}
        />
      </Card>
    </>
  );
}
