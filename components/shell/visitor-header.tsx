"use client";

import { AppHeader, PublicHeader } from "./app-header";
import { useSessionView } from "./use-session-view";

/**
 * The public pages' header. Their HTML is prerendered and the same for everyone, so it starts as
 * the signed-out header and becomes the signed-in one once /api/session names the visitor.
 */
export function VisitorHeader() {
  const view = useSessionView();
  if (view?.signedIn && view.shop) return <AppHeader context={{ user: view.user, shop: view.shop, shops: view.shops }} />;
  return <PublicHeader />;
}
