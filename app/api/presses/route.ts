import { NextResponse, type NextRequest } from "next/server";
import { z } from "zod";
import { listPresses } from "@/lib/data/presses";
import { getActiveShop } from "@/lib/data/shops";
import { apiRoute, apiSession, jsonError } from "@/lib/http";
import { ID_PATTERN } from "@/lib/ids";

/** Presses of `?shopId=` (default: the user's working shop); a shop the user is not in lists nothing. */
export const GET = apiRoute(async (req: NextRequest) => {
  const current = await apiSession(req);
  if (!current) return jsonError(401, "Sign in first.");
  const actor = { userId: current.user.id };
  const requested = req.nextUrl.searchParams.get("shopId");
  const shopId = requested ? z.string().regex(ID_PATTERN).parse(requested) : (await getActiveShop(actor, current.user.activeShopId))?.id;
  if (!shopId) return NextResponse.json({ presses: [] });
  return NextResponse.json({ presses: await listPresses(actor, shopId) });
});
