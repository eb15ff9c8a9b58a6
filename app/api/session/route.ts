import { NextResponse, type NextRequest } from "next/server";
import type { SessionView } from "@/lib/auth/session-view";
import { getMyShops } from "@/lib/data/shops";
import { apiRoute, apiSession } from "@/lib/http";

/**
 * Who is visiting, for the prerendered public pages' header: 200 either way (a signed-out visitor
 * is an answer, not an error), so the page's console stays clean. /api/me is the 401 variant.
 */
export const GET = apiRoute(async (req: NextRequest) => {
  const current = await apiSession(req);
  if (!current) return NextResponse.json({ signedIn: false } satisfies SessionView);
  const { shop, shops } = await getMyShops({ userId: current.user.id }, current.user.activeShopId);
  const { displayName, email, unitSystem } = current.user;
  return NextResponse.json({ signedIn: true, user: { displayName, email, unitSystem }, shop, shops } satisfies SessionView);
});
