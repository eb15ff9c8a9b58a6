import { NextResponse, type NextRequest } from "next/server";
import { decodeCursor, listMyBookings } from "@/lib/data/bookings";
import { apiRoute, requireApiSession } from "@/lib/http";

/** The caller's bookings that have not ended, 20 a page; pass `?after=` the previous page's `next`. */
export const GET = apiRoute(async (req: NextRequest) => {
  const current = await requireApiSession(req);
  return NextResponse.json(await listMyBookings({ userId: current.user.id }, decodeCursor(req.nextUrl.searchParams.get("after"))));
});
