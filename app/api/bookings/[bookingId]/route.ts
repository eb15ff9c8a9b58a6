import { NextResponse, type NextRequest } from "next/server";
import { cancelBooking } from "@/lib/data/bookings";
import { apiRoute, requireApiSession } from "@/lib/http";

type Context = { params: Promise<{ bookingId: string }> };

/** Cancels a booking: the holder, or a manager of the shop. */
export const DELETE = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { bookingId } = await params;
  await cancelBooking({ userId: current.user.id }, bookingId);
  return new NextResponse(null, { status: 204 });
});
