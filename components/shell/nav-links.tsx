"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";

export const APP_NAV = [
  { href: "/dashboard", label: "Dashboard" },
  { href: "/presses", label: "Presses" },
  { href: "/sizing", label: "Sizing" },
  { href: "/inspections", label: "Inspections" },
  { href: "/bookings", label: "Bookings" },
  { href: "/shop", label: "Shop" },
] as const;

export function NavLinks() {
  const pathname = usePathname();
  return (
    <nav aria-label="Main" className="-mx-4 overflow-x-auto px-4 md:mx-0 md:px-0">
      <ul className="flex gap-1 whitespace-nowrap">
        {APP_NAV.map((item) => {
          const active = pathname === item.href || pathname.startsWith(`${item.href}/`);
          return (
            <li key={item.href}>
              <Link
                href={item.href}
                aria-current={active ? "page" : undefined}
                className={`inline-flex min-h-10 items-center rounded-md px-3 text-sm font-medium ${
                  active ? "bg-steel-700 text-white" : "text-steel-200 hover:bg-steel-800 hover:text-white"
                }`}
              >
                {item.label}
              </Link>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
