import Link from "next/link";
import { connection } from "next/server";
import { buttonClass } from "@/components/ui/button";

/**
 * Rendered per request, not prerendered at build time: the CSP (proxy.ts) allows only scripts
 * carrying this request's nonce, and a page built ahead of time has no nonce, so the browser would
 * block its inline scripts. Pages that answer 404 at build time (e.g. /dev/outbox outside
 * development) get this page too.
 */
export default async function NotFound() {
  await connection();
  return (
    <div className="mx-auto max-w-lg px-4 py-16 text-center">
      <p className="font-mono text-sm font-semibold text-oil-600">404</p>
      <h1 className="mt-2 text-2xl font-semibold">Nothing here</h1>
      <p className="mt-3 text-steel-600">This page does not exist, or it belongs to a shop you are not a member of.</p>
      <Link href="/dashboard" className={`${buttonClass("secondary")} mt-6`}>
        Back to the dashboard
      </Link>
    </div>
  );
}
