import { NextResponse, type NextRequest } from "next/server";
import { getPressStatus } from "@/lib/data/press-status";
import { apiRoute, requireApiSession } from "@/lib/http";

type Context = { params: Promise<{ pressId: string }> };

/** `{ code, label, reasons, notes, usable }` from lib/status.ts. */
export const GET = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { pressId } = await params;
  return NextResponse.json(await getPressStatus({ userId: current.user.id }, pressId));
});
