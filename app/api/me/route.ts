import { NextResponse, type NextRequest } from "next/server";
import { listMyShops } from "@/lib/data/shops";
import { apiRoute, requireApiSession } from "@/lib/http";

/** The signed-in user and their shops with roles. */
export const GET = apiRoute(async (req: NextRequest) => {
  const current = await requireApiSession(req);
  const shops = await listMyShops({ userId: current.user.id });
  return NextResponse.json({ user: current.user, shops });
});
