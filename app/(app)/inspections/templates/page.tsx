import type { Metadata } from "next";
import Link from "next/link";
import { Card, PageTitle } from "@/components/ui/card";
import { requireShopContext } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { listTemplates } from "@/lib/data/inspection-templates";
import { CADENCE_LABELS } from "@/lib/inspections/labels";

export const metadata: Metadata = { title: "Checklists" };

export default async function TemplatesPage() {
  const { user, shop } = await requireShopContext();
  const templates = await listTemplates({ userId: user.id }, shop.id);
  const mayEdit = can(shop.role, "editInspectionTemplates");
  return (
    <>
      <PageTitle title="Checklists" subtitle={`The inspection checklists of ${shop.name}.${mayEdit ? " Managers can change them." : ""}`} />
      <div className="grid gap-4 lg:grid-cols-2">
        {templates.map((t) => (
          <Card key={t.id} title={t.name} actions={<Link href={`/inspections/templates/${t.id}`} className="text-sm font-semibold text-oil-700 underline">{mayEdit ? "Edit" : "View"}</Link>}>
            <p className="text-sm text-steel-600">
              {CADENCE_LABELS[t.cadence]} · {t.items.length} items ({t.items.filter((i) => i.critical).length} critical) · signed by {t.signerRole === "member" ? "any member" : "an inspector or manager"}
            </p>
          </Card>
        ))}
      </div>
    </>
  );
}
