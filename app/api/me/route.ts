import { NextResponse, type NextRequest } from "next/server";
import { listMyShops } from "@/lib/data/shops";
import { apiRoute, apiSession, jsonError } from "@/lib/http";

/** The signed-in user and their shops with roles. */
export const GET = apiRoute(async (req: NextRequest) => {
  const current = await apiSession(req);
  if (!current) return jsonError(401, "Sign in first.");
  const shops = await listMyShops({ userId: current.user.id });
  return NextResponse.json({ user: current.user, shops });
});
