import { NextResponse, type NextRequest } from "next/server";
import { listDueForActor } from "@/lib/data/service-due";
import { apiRoute, requireApiSession } from "@/lib/http";

/** What is due soon or overdue across the signed-in user's shops, most urgent first. */
export const GET = apiRoute(async (req: NextRequest) => {
  const current = await requireApiSession(req);
  return NextResponse.json({ items: await listDueForActor({ userId: current.user.id }) });
});
