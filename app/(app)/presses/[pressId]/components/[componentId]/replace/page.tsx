import type { Metadata } from "next";
import { ComponentForm } from "@/components/press/component-form";
import { Card, PageTitle } from "@/components/ui/card";
import { componentFormValues } from "@/lib/press/component-form";
import { componentEditContext } from "@/lib/press/page-context";
import { replaceComponentAction } from "../../../actions";

export const metadata: Metadata = { title: "Replace part" };

/** Starts from the old part's figures, since a replacement is usually close to it. */
export default async function ReplaceComponentPage({ params }: { params: Promise<{ pressId: string; componentId: string }> }) {
  const { pressId, componentId } = await params;
  const { press, component, units, today } = await componentEditContext(pressId, componentId);
  const initial = { ...componentFormValues(component, units), installedOn: today, purchased: "on", cost: "", label: component.label };
  return (
    <>
      <PageTitle title={`Replace ${component.label}`} subtitle={`${press.name} · the old part stays in the history`} />
      <Card>
        <ComponentForm action={replaceComponentAction.bind(null, pressId, componentId)} mode="replace" kind={component.kind} initial={initial} units={units} currency={press.currency} today={today} />
      </Card>
    </>
  );
}
