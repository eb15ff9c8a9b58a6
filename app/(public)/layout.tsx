import type { ReactNode } from "react";
import { AppHeader, PublicHeader } from "@/components/shell/app-header";
import { SiteFooter } from "@/components/shell/site-footer";
import { getShopContext } from "@/lib/auth/current";

/** Public pages; a signed-in visitor (e.g. on the sizing page) keeps the full navigation. */
export default async function PublicLayout({ children }: { children: ReactNode }) {
  const context = await getShopContext();
  const header = context ? <AppHeader context={context} /> : <PublicHeader />;
  return (
    <>
      {header}
      <main className="flex-1">{children}</main>
      <SiteFooter />
    </>
  );
}
