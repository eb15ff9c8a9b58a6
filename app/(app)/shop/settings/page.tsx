import type { Metadata } from "next";
import { forbidden } from "next/navigation";
import { Card, PageTitle } from "@/components/ui/card";
import { requireShopContext } from "@/lib/auth/current";
import { canEditShop } from "@/lib/auth/permissions";
import { getOpeningHours, listMembers } from "@/lib/data/shops";
import { timeZoneOptions } from "@/lib/validation/shop";
import { MemberRoleForm } from "./_components/member-role-form";
import { OpeningHoursForm } from "./_components/opening-hours-form";
import { RemoveMemberForm } from "./_components/remove-member-form";
import { ShopSettingsForm } from "./_components/shop-settings-form";

export const metadata: Metadata = { title: "Shop settings" };

/** Managers only: everyone else gets the 403 page (the actions re-check in the data layer). */
export default async function ShopSettingsPage() {
  const { user, shop } = await requireShopContext();
  if (!canEditShop(shop.role)) forbidden();
  const [members, hours] = await Promise.all([listMembers({ userId: user.id }, shop.id), getOpeningHours({ userId: user.id }, shop.id)]);
  return (
    <>
      <PageTitle title="Shop settings" subtitle={shop.name} />
      <div className="grid gap-4 lg:grid-cols-2">
        <Card title="Name and time zone">
          <ShopSettingsForm name={shop.name} timeZone={shop.timeZone} zones={timeZoneOptions()} />
        </Card>
        <Card title="Roles">
          <ul className="divide-y divide-steel-100">
            {members.map((m) => (
              <li key={m.userId} className="flex flex-col gap-2 py-3 sm:flex-row sm:items-center sm:justify-between">
                <div className="min-w-0">
                  <p className="truncate font-medium">{m.displayName}</p>
                  <p className="truncate text-xs text-steel-500">{m.email}</p>
                </div>
                <div className="flex flex-wrap items-center gap-1">
                  <MemberRoleForm userId={m.userId} role={m.role} name={m.displayName} />
                  {m.userId !== user.id ? <RemoveMemberForm userId={m.userId} name={m.displayName} /> : null}
                </div>
              </li>
            ))}
          </ul>
          <p className="mt-3 text-xs text-steel-500">A shop always keeps at least one manager: the last one cannot be demoted or removed.</p>
        </Card>
        <Card title="Opening hours">
          <OpeningHoursForm hours={hours} />
        </Card>
      </div>
    </>
  );
}
