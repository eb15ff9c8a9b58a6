"use client";

import { useRouter } from "next/navigation";
import { useEffect } from "react";
import { useSessionView } from "./use-session-view";

/**
 * Sends a signed-in visitor of a prerendered account-less page (landing, sign-in, sign-up) on to
 * `to`, which the caller has already checked (safeNextPath). The page itself cannot: its HTML is
 * built before any visitor exists.
 */
export function RedirectWhenSignedIn({ to }: { to: string }) {
  const view = useSessionView();
  const router = useRouter();
  const signedIn = view?.signedIn === true;
  useEffect(() => {
    if (signedIn) router.replace(to);
  }, [signedIn, router, to]);
  return null;
}
