"use client";

import type { ReactNode } from "react";
import { SWRConfig } from "swr";

/**
 * A cache of its own for a server-rendered list that SWR then keeps live: after a server action
 * redirects back, the fresh server data shows at once instead of the global cache's older copy.
 */
export function FreshSWR({ children }: { children: ReactNode }) {
  return <SWRConfig value={{ provider: () => new Map() }}>{children}</SWRConfig>;
}
