import type { ShopSummary } from "@/lib/data/shops";
import { RoleBadge } from "@/components/ui/role-badge";
import { switchShopAction } from "./shell-actions";

/** A disclosure listing the user's shops; works without JavaScript (plain forms). */
export function ShopSwitcher({ shop, shops }: { shop: ShopSummary; shops: ShopSummary[] }) {
  return (
    <details className="group relative">
      <summary className="flex min-h-10 cursor-pointer list-none items-center gap-2 rounded-md px-2 text-sm text-white hover:bg-steel-800">
        <span className="max-w-[10rem] truncate font-semibold sm:max-w-[16rem]" data-testid="active-shop">{shop.name}</span>
        <span aria-hidden="true" className="text-steel-300">▾</span>
        <span className="sr-only">Switch shop</span>
      </summary>
      <div className="absolute left-0 z-20 mt-2 w-72 rounded-lg bg-white p-2 text-ink shadow-lg ring-1 ring-steel-200">
        <p className="px-2 pb-1 text-xs font-semibold uppercase tracking-wide text-steel-500">Your shops</p>
        <ul>
          {shops.map((s) => (
            <li key={s.id}>
              <form action={switchShopAction}>
                <input type="hidden" name="shopId" value={s.id} />
                <button
                  type="submit"
                  aria-current={s.id === shop.id ? "true" : undefined}
                  className="flex w-full items-center justify-between gap-2 rounded-md px-2 py-2 text-left text-sm hover:bg-steel-100 aria-[current=true]:bg-steel-100"
                >
                  <span className="truncate">{s.name}</span>
                  <RoleBadge role={s.role} />
                </button>
              </form>
            </li>
          ))}
        </ul>
      </div>
    </details>
  );
}
