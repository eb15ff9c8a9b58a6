import { NextResponse, type NextRequest } from "next/server";
import { createBooking, listPressBookings } from "@/lib/data/bookings";
import { apiRoute, requireApiSession, readJsonBody } from "@/lib/http";
import { bookingInputSchema, bookingWindowSchema } from "@/lib/validation/shop-use";

type Context = { params: Promise<{ pressId: string }> };

/** Bookings overlapping `?from=&to=` (ISO 8601 with offset; at most 14 days; default the next 7 days). */
export const GET = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { pressId } = await params;
  const q = req.nextUrl.searchParams;
  const now = new Date();
  const window = bookingWindowSchema.parse({
    from: q.get("from") ?? now.toISOString(),
    to: q.get("to") ?? new Date(now.getTime() + 7 * 86_400_000).toISOString(),
  });
  return NextResponse.json({ bookings: await listPressBookings({ userId: current.user.id }, pressId, window.from, window.to) });
});

/** Books `{ startsAt, endsAt }`: 201, 409 on overlap, 423 while tagged out or not in service. */
export const POST = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { pressId } = await params;
  const slot = bookingInputSchema.parse(await readJsonBody(req));
  const booking = await createBooking({ userId: current.user.id }, pressId, slot);
  return NextResponse.json(booking, { status: 201, headers: { location: `/api/bookings/${booking.id}` } });
});
