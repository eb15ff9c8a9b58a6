import Link from "next/link";
import { LogoMark } from "@/components/ui/logo";
import type { ShopSummary } from "@/lib/data/shops";
import { AccountMenu } from "./account-menu";
import { NavLinks } from "./nav-links";
import { ShopSwitcher } from "./shop-switcher";

type HeaderContext = { user: { displayName: string; email: string }; shop: ShopSummary; shops: ShopSummary[] };

/** Signed-in header: mark, shop switcher, account menu, and the main navigation below on phones. */
export function AppHeader({ context }: { context: HeaderContext }) {
  return (
    <header className="no-print bg-steel-900 text-white">
      <div className="mx-auto flex max-w-6xl flex-col gap-2 px-4 py-2 md:flex-row md:items-center md:gap-6">
        <div className="flex items-center justify-between gap-2">
          <div className="flex min-w-0 items-center gap-2">
            <Link href="/dashboard" aria-label="Presswright dashboard" className="shrink-0">
              <LogoMark />
            </Link>
            <ShopSwitcher shop={context.shop} shops={context.shops} />
          </div>
          <div className="md:hidden">
            <AccountMenu displayName={context.user.displayName} email={context.user.email} />
          </div>
        </div>
        <div className="min-w-0 flex-1">
          <NavLinks />
        </div>
        <div className="hidden md:block">
          <AccountMenu displayName={context.user.displayName} email={context.user.email} />
        </div>
      </div>
    </header>
  );
}

export function PublicHeader() {
  return (
    <header className="no-print bg-steel-900 text-white">
      <div className="mx-auto flex max-w-6xl items-center justify-between gap-3 px-4 py-3">
        <Link href="/" className="flex items-center gap-2 font-semibold tracking-tight">
          <LogoMark />
          <span className="text-lg">Presswright</span>
        </Link>
        <nav aria-label="Public" className="flex items-center gap-1 text-sm">
          <Link href="/sizing" className="rounded-md px-3 py-2 text-steel-200 hover:bg-steel-800 hover:text-white">
            Sizing
          </Link>
          <Link href="/sign-in" className="rounded-md px-3 py-2 text-steel-200 hover:bg-steel-800 hover:text-white">
            Sign in
          </Link>
          <Link href="/sign-up" className="hidden rounded-md bg-oil-500 px-3 py-2 font-semibold text-ink hover:bg-oil-400 sm:inline-block">
            Create account
          </Link>
        </nav>
      </div>
    </header>
  );
}
