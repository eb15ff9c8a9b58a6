import type { Metadata } from "next";
import Link from "next/link";
import { buttonClass } from "@/components/ui/button";
import { Card, PageTitle } from "@/components/ui/card";
import { RoleBadge } from "@/components/ui/role-badge";
import { requireShopContext } from "@/lib/auth/current";
import { can, canEditShop } from "@/lib/auth/permissions";
import { ShopInvitations } from "@/components/shop/invitations";
import { getOpeningHours, listMembers } from "@/lib/data/shops";
import { formatMinutes } from "@/lib/booking-rules";
import { WEEKDAY_NAMES } from "@/lib/validation/shop";

export const metadata: Metadata = { title: "Shop" };

export default async function ShopPage() {
  const { user, shop } = await requireShopContext();
  const [members, hours] = await Promise.all([listMembers({ userId: user.id }, shop.id), getOpeningHours({ userId: user.id }, shop.id)]);
  return (
    <>
      <PageTitle
        title={shop.name}
        subtitle={`${shop.personal ? "Personal shop" : "Shared shop"} · times shown in ${shop.timeZone}`}
        actions={
          canEditShop(shop.role) ? (
            <Link href="/shop/settings" className={buttonClass("secondary")}>
              Shop settings
            </Link>
          ) : null
        }
      />
      <Card title={`Members (${members.length})`}>
        <ul className="divide-y divide-steel-100">
          {members.map((m) => (
            <li key={m.userId} className="flex flex-wrap items-center justify-between gap-2 py-2">
              <div className="min-w-0">
                <p className="truncate font-medium">{m.displayName}</p>
                <p className="truncate text-xs text-steel-500">{m.email}</p>
              </div>
              <RoleBadge role={m.role} />
            </li>
          ))}
        </ul>
      </Card>
      {can(shop.role, "manageMembers") ? (
        <Card title="Invite by e-mail" className="mt-4">
          <ShopInvitations userId={user.id} shopId={shop.id} />
        </Card>
      ) : null}
      <Card title="Opening hours" className="mt-4">
        {hours ? (
          <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm" data-testid="opening-hours">
            {WEEKDAY_NAMES.map((day, i) => (
              <div key={day} className="contents">
                <dt className="text-steel-600">{day}</dt>
                <dd className="font-mono">{hours[i] ? `${formatMinutes(hours[i].opens)}–${formatMinutes(hours[i].closes)}` : "Closed"}</dd>
              </div>
            ))}
          </dl>
        ) : (
          <p className="text-sm text-steel-600">No opening hours set: presses can be booked at any time.</p>
        )}
        <p className="mt-2 text-xs text-steel-500">Times in {shop.timeZone}.</p>
      </Card>
    </>
  );
}
