import Link from "next/link";
import { signOutAction } from "./shell-actions";

export function AccountMenu({ displayName, email }: { displayName: string; email: string }) {
  const initials = displayName
    .split(/\s+/)
    .map((w) => w[0] ?? "")
    .join("")
    .slice(0, 2)
    .toUpperCase();
  return (
    <details className="relative">
      <summary className="flex h-10 w-10 cursor-pointer list-none items-center justify-center rounded-full bg-oil-500 text-sm font-bold text-ink">
        {/* Named by words, not by an aria-label that would hide the initials the eye sees. */}
        <span aria-hidden="true">{initials || "?"}</span>
        <span className="sr-only">Account menu</span>
      </summary>
      <div className="absolute right-0 z-20 mt-2 w-64 rounded-lg bg-white p-2 text-ink shadow-lg ring-1 ring-steel-200">
        <p className="truncate px-2 pt-1 text-sm font-semibold">{displayName}</p>
        <p className="truncate px-2 pb-2 text-xs text-steel-500">{email}</p>
        <Link href="/account" className="block rounded-md px-2 py-2 text-sm hover:bg-steel-100">
          Account and password
        </Link>
        <form action={signOutAction}>
          <button type="submit" className="w-full rounded-md px-2 py-2 text-left text-sm hover:bg-steel-100">
            Sign out
          </button>
        </form>
      </div>
    </details>
  );
}
