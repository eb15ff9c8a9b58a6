import { type NextRequest } from "next/server";
import { getBookingIcs } from "@/lib/data/bookings";
import { apiRoute, requireApiSession } from "@/lib/http";

type Context = { params: Promise<{ bookingId: string }> };

/** The booking as a calendar file to download. */
export const GET = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { bookingId } = await params;
  const ics = await getBookingIcs({ userId: current.user.id }, bookingId);
  return new Response(ics, {
    headers: { "content-type": "text/calendar; charset=utf-8", "content-disposition": `attachment; filename="booking-${bookingId}.ics"`, "cache-control": "no-store" },
  });
});
