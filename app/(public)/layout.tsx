import type { ReactNode } from "react";
import { SiteFooter } from "@/components/shell/site-footer";
import { VisitorHeader } from "@/components/shell/visitor-header";

/**
 * Public pages. Reads no cookie, so the account-less ones are prerendered (proxy.ts gives them a
 * hash-based CSP); the header learns about a signed-in visitor on the client.
 */
export default function PublicLayout({ children }: { children: ReactNode }) {
  return (
    <>
      <VisitorHeader />
      <main className="flex-1">{children}</main>
      <SiteFooter />
    </>
  );
}
