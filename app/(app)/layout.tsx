import type { ReactNode } from "react";
import { AppHeader } from "@/components/shell/app-header";
import { SiteFooter } from "@/components/shell/site-footer";
import { requireShopContext } from "@/lib/auth/current";

export default async function SignedInLayout({ children }: { children: ReactNode }) {
  const context = await requireShopContext();
  return (
    <>
      <AppHeader context={context} />
      <main className="mx-auto w-full max-w-6xl px-4 py-6 sm:py-8">{children}</main>
      <SiteFooter />
    </>
  );
}
