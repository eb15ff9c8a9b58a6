import { NextResponse, type NextRequest } from "next/server";
import { getPress } from "@/lib/data/presses";
import { apiRoute, apiSession, jsonError } from "@/lib/http";

type Context = { params: Promise<{ pressId: string }> };

/** One press; another shop's press (or an unknown id) is 404. */
export const GET = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await apiSession(req);
  if (!current) return jsonError(401, "Sign in first.");
  const { pressId } = await params;
  const { role: _role, ...press } = await getPress({ userId: current.user.id }, pressId);
  return NextResponse.json({ press });
});
