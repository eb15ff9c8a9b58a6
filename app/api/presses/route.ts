import { NextResponse, type NextRequest } from "next/server";
import { z } from "zod";
import { createPress } from "@/lib/data/press-edits";
import { listPressesWithStatus } from "@/lib/data/press-status";
import { getActiveShop } from "@/lib/data/shops";
import { apiRoute, readJsonBody, jsonError, requireApiSession } from "@/lib/http";
import { ID_PATTERN } from "@/lib/ids";
import { pressInputSchema } from "@/lib/validation/press";

const shopIdParam = z.string().regex(ID_PATTERN, "Unknown shop id.");
const createPressBody = pressInputSchema.extend({ shopId: shopIdParam.optional() });

/** Presses of `?shopId=` (default: the user's working shop) with their status; a shop the user is not in lists nothing. */
export const GET = apiRoute(async (req: NextRequest) => {
  const current = await requireApiSession(req);
  const actor = { userId: current.user.id };
  const requested = req.nextUrl.searchParams.get("shopId");
  const shopId = requested ? shopIdParam.parse(requested) : (await getActiveShop(actor, current.user.activeShopId))?.id;
  if (!shopId) return NextResponse.json({ presses: [] });
  return NextResponse.json({ presses: await listPressesWithStatus(actor, shopId) });
});

/** Creates a press (SI body) in `shopId` or the working shop. Managers only. */
export const POST = apiRoute(async (req: NextRequest) => {
  const current = await requireApiSession(req);
  const actor = { userId: current.user.id };
  // One strict schema for the whole body, so every unknown key (even "__proto__") is named.
  const { shopId: requested, ...input } = createPressBody.parse(await readJsonBody(req));
  const shopId = requested ?? (await getActiveShop(actor, current.user.activeShopId))?.id;
  if (!shopId) return jsonError(404, "Shop not found");
  const { id } = await createPress(actor, shopId, input);
  return NextResponse.json({ id }, { status: 201 });
});
