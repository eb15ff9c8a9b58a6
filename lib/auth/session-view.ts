import type { ShopSummary } from "@/lib/data/shops";
import type { SessionUser } from "./session";

/**
 * What a prerendered public page learns about its visitor from GET /api/session, after it is on
 * screen: the page's HTML is the same for everyone, so the header and the signed-in extras
 * (e.g. saving a sizing) are filled in on the client. No ids beyond the shops' own.
 */
export type SessionView =
  | { signedIn: false }
  | {
      signedIn: true;
      user: Pick<SessionUser, "displayName" | "email" | "unitSystem">;
      /** The working shop, or null for an account in no shop. */
      shop: ShopSummary | null;
      shops: ShopSummary[];
    };
