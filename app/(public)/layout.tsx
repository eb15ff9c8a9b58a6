import type { ReactNode } from "react";
import { AppHeader, PublicHeader } from "@/components/shell/app-header";
import { SiteFooter } from "@/components/shell/site-footer";
import { getCurrentSession } from "@/lib/auth/current";
import { getActiveShop, listMyShops } from "@/lib/data/shops";

/** Public pages; a signed-in visitor (e.g. on the sizing page) keeps the full navigation. */
export default async function PublicLayout({ children }: { children: ReactNode }) {
  const current = await getCurrentSession();
  let header = <PublicHeader />;
  if (current) {
    const actor = { userId: current.user.id };
    const [shop, shops] = await Promise.all([getActiveShop(actor, current.user.activeShopId), listMyShops(actor)]);
    if (shop) header = <AppHeader context={{ user: current.user, shop, shops }} />;
  }
  return (
    <>
      {header}
      <main className="flex-1">{children}</main>
      <SiteFooter />
    </>
  );
}
