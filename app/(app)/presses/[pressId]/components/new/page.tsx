import type { Metadata } from "next";
import { ComponentForm } from "@/components/press/component-form";
import { Card, PageTitle } from "@/components/ui/card";
import { KIND_LABELS } from "@/lib/press/component-fields";
import { pressEditContext } from "@/lib/press/page-context";
import type { ComponentKind } from "@/lib/validation/component-spec";
import { addComponentAction } from "../../actions";

export const metadata: Metadata = { title: "Add a part" };

export default async function NewComponentPage({ params, searchParams }: { params: Promise<{ pressId: string }>; searchParams: Promise<{ kind?: string }> }) {
  const { pressId } = await params;
  const { kind } = await searchParams;
  const { press, units, today } = await pressEditContext(pressId);
  const initialKind = kind && kind in KIND_LABELS ? (kind as ComponentKind) : "cylinder";
  return (
    <>
      <PageTitle title="Add a part" subtitle={press.name} />
      <Card>
        <ComponentForm
          action={addComponentAction.bind(null, pressId)}
          mode="add"
          initial={{ kind: initialKind, installedOn: press.lifecycle === "planned" ? "" : today, purchased: press.lifecycle === "planned" ? "off" : "on" }}
          units={units}
          currency={press.currency}
          today={today}
        />
      </Card>
    </>
  );
}
