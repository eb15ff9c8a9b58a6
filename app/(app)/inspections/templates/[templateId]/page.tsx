import type { Metadata } from "next";
import Link from "next/link";
import { TemplateEditor } from "@/components/inspection/template-editor";
import { Card, PageTitle } from "@/components/ui/card";
import { orPageError, requireShopContext } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { getTemplate } from "@/lib/data/inspection-templates";
import { AREA_LABELS, CADENCE_LABELS } from "@/lib/inspections/labels";
import { saveTemplateAction } from "../actions";

export const metadata: Metadata = { title: "Checklist" };

export default async function TemplatePage({ params }: { params: Promise<{ templateId: string }> }) {
  const { templateId } = await params;
  const { user } = await requireShopContext();
  const template = await orPageError(getTemplate({ userId: user.id }, templateId));
  const back = (
    <Link href="/inspections/templates" className="text-sm font-semibold text-oil-700 underline">
      ← Checklists
    </Link>
  );
  if (!can(template.role, "editInspectionTemplates")) {
    return (
      <>
        <PageTitle title={template.name} subtitle={CADENCE_LABELS[template.cadence]} actions={back} />
        <Card>
          <ol className="flex list-decimal flex-col gap-2 pl-5 text-sm">
            {template.items.map((i) => (
              <li key={i.key}>
                <span className="text-steel-500">{AREA_LABELS[i.area]}:</span> {i.text}
                {i.critical ? <span className="ml-1 text-xs font-semibold text-fail">critical</span> : null}
              </li>
            ))}
          </ol>
        </Card>
      </>
    );
  }
  return (
    <>
      <PageTitle title={`Edit: ${template.name}`} actions={back} />
      <Card>
        <TemplateEditor action={saveTemplateAction.bind(null, template.id)} name={template.name} cadence={template.cadence} items={template.items} />
      </Card>
    </>
  );
}
