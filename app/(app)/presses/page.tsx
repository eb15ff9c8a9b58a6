import type { Metadata } from "next";
import Link from "next/link";
import { PressTable } from "@/components/press/press-table";
import { FreshSWR } from "@/components/ui/fresh-swr";
import { buttonClass } from "@/components/ui/button";
import { PageTitle } from "@/components/ui/card";
import { requireShopContext } from "@/lib/auth/current";
import { canEditPress } from "@/lib/auth/permissions";
import { listPressesWithStatus } from "@/lib/data/press-status";

export const metadata: Metadata = { title: "Presses" };

export default async function PressesPage() {
  const { user, shop } = await requireShopContext();
  const presses = await listPressesWithStatus({ userId: user.id }, shop.id);
  return (
    <>
      <PageTitle
        title="Presses"
        subtitle={`Every press of ${shop.name}.`}
        actions={
          canEditPress(shop.role) ? (
            <Link href="/presses/new" className={buttonClass("primary")}>
              New press
            </Link>
          ) : null
        }
      />
      <FreshSWR>
        <PressTable initial={presses} units={user.unitSystem} />
      </FreshSWR>
    </>
  );
}
