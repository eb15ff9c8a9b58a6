import { NextResponse, type NextRequest } from "next/server";
import { verifyPressChain } from "@/lib/data/inspection-sign";
import { apiRoute, requireApiSession } from "@/lib/http";

type Context = { params: Promise<{ pressId: string }> };

/** Recomputes the press's chain of signed inspections and names every record that no longer matches. */
export const GET = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { pressId } = await params;
  return NextResponse.json(await verifyPressChain({ userId: current.user.id }, pressId));
});
