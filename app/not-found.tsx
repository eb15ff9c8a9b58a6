import Link from "next/link";
import { buttonClass } from "@/components/ui/button";

/**
 * Prerendered: every address that matches no route gets this HTML, with a CSP that lists the
 * hashes of its inline scripts (proxy.ts, lib/csp/prerendered-pages.ts). A page that calls
 * notFound() while rendering for a request renders it then, with that request's nonce. It reads
 * no request data: it is part of every page's tree, so doing so would make every page dynamic.
 */
export default function NotFound() {
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
