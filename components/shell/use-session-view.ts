"use client";

import { usePathname } from "next/navigation";
import { useEffect } from "react";
import useSWR from "swr";
import type { SessionView } from "@/lib/auth/session-view";
import { fetchJson } from "@/lib/fetch-json";

/**
 * The visitor of a prerendered public page (undefined until /api/session answers). Asked again
 * on every navigation: the public layout stays mounted across sign-in and sign-out redirects.
 */
export function useSessionView(): SessionView | undefined {
  const pathname = usePathname();
  const { data, mutate } = useSWR<SessionView>("/api/session", fetchJson, { revalidateOnFocus: false, revalidateOnMount: false });
  useEffect(() => {
    void mutate();
  }, [pathname, mutate]);
  return data;
}
