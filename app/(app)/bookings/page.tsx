import type { Metadata } from "next";
import Link from "next/link";
import { BookingForm } from "@/components/booking/booking-form";
import { CancelBooking } from "@/components/booking/cancel-booking";
import { WeekView } from "@/components/booking/week-view";
import { Card, PageTitle } from "@/components/ui/card";
import { FreshSWR } from "@/components/ui/fresh-swr";
import { StatusBadge } from "@/components/ui/status-badge";
import { requireShopContext } from "@/lib/auth/current";
import { decodeCursor, listMyBookings, listPressBookings } from "@/lib/data/bookings";
import { listShopStatuses } from "@/lib/data/press-status";
import { listPresses } from "@/lib/data/presses";
import { localDate, parseLocal, slotText, startOfLocalDay, toWallTime } from "@/lib/time-zone";

export const metadata: Metadata = { title: "Bookings" };

type Search = Promise<{ press?: string; week?: string; after?: string }>;

export default async function BookingsPage({ searchParams }: { searchParams: Search }) {
  const { user, shop } = await requireShopContext();
  const actor = { userId: user.id };
  const q = await searchParams;
  const zone = shop.timeZone;
  const now = new Date();
  const [presses, statuses, mine] = await Promise.all([listPresses(actor, shop.id), listShopStatuses(actor, shop.id, now), listMyBookings(actor, decodeCursor(q.after), now)]);
  const press = presses.find((p) => p.id === q.press) ?? presses.find((p) => p.lifecycle === "in-service") ?? presses[0];

  // The week (Monday first) containing ?week=YYYY-MM-DD, or this week, in the shop's zone.
  const anchor = (q.week && parseLocal(q.week, "12:00", zone)) || now;
  const monday = startOfLocalDay(anchor, zone, -toWallTime(anchor, zone).weekday);
  const dayStarts = Array.from({ length: 8 }, (_, i) => startOfLocalDay(monday, zone, i));
  const days = dayStarts.slice(0, 7).map((d) => localDate(d, zone));
  const weekLink = (offset: number): string => `/bookings?press=${press?.id ?? ""}&week=${localDate(startOfLocalDay(monday, zone, offset * 7), zone)}`;
  const week = press ? await listPressBookings(actor, press.id, dayStarts[0]!, dayStarts[7]!, now) : [];
  const status = press ? statuses.get(press.id) : undefined;

  return (
    <>
      <PageTitle title="Bookings" subtitle={`Press time at ${shop.name}. Times in ${zone}.`} />
      {presses.length === 0 ? (
        <Card>
          <p className="text-sm text-steel-600">This shop has no presses yet.</p>
        </Card>
      ) : (
        <div className="flex flex-col gap-4">
          <div className="grid gap-4 lg:grid-cols-2 [&>*]:min-w-0">
            <Card title="Book a press">
              <BookingForm presses={presses} defaultPressId={press?.id} today={localDate(now, zone)} timeZone={zone} />
            </Card>
            <Card title="My bookings">
              {mine.bookings.length === 0 ? <p className="text-sm text-steel-600">No upcoming bookings.</p> : null}
              <ul className="divide-y divide-steel-100" data-testid="my-bookings">
                {mine.bookings.map((b) => (
                  <li key={b.id} className="flex flex-wrap items-center justify-between gap-2 py-2 text-sm">
                    <div className="min-w-0">
                      <p className="font-medium">{b.pressName}</p>
                      <p className="text-steel-600">{slotText(b, zone)}</p>
                    </div>
                    <div className="flex items-center gap-1">
                      <a href={`/api/bookings/${b.id}/ics`} className="inline-flex min-h-10 items-center px-2 text-oil-700 underline">
                        .ics
                      </a>
                      {b.canCancel ? <CancelBooking bookingId={b.id} label={`${b.pressName} ${slotText(b, zone)}`} /> : null}
                    </div>
                  </li>
                ))}
              </ul>
              {mine.next ? (
                <Link href={`/bookings?press=${press?.id ?? ""}&after=${mine.next}`} className="mt-2 inline-flex min-h-10 items-center text-sm text-oil-700 underline">
                  Later bookings
                </Link>
              ) : null}
            </Card>
          </div>
          {press ? (
            <Card
              title={
                <span className="flex flex-wrap items-center gap-2">
                  Week of {days[0]} · {press.name} {status ? <StatusBadge status={status} /> : null}
                </span>
              }
            >
              <nav aria-label="Presses and weeks" className="mb-3 flex flex-wrap items-center gap-2 text-sm">
                {presses.map((p) => (
                  <Link key={p.id} href={`/bookings?press=${p.id}&week=${days[0]}`} aria-current={p.id === press.id ? "page" : undefined} className={`inline-flex min-h-10 items-center rounded-full px-3 ring-1 ${p.id === press.id ? "bg-steel-800 text-white ring-steel-800" : "bg-white ring-steel-200"}`}>
                    {p.name}
                  </Link>
                ))}
                <span className="ml-auto flex gap-2">
                  <Link href={weekLink(-1)} className="inline-flex min-h-10 items-center px-2 text-oil-700 underline">
                    Previous week
                  </Link>
                  <Link href={weekLink(1)} className="inline-flex min-h-10 items-center px-2 text-oil-700 underline">
                    Next week
                  </Link>
                </span>
              </nav>
              {status && !status.usable ? (
                <p role="status" className="mb-3 rounded-md bg-fail-soft p-2 text-sm text-fail">
                  Not bookable now: {status.reasons.join(" ")}
                </p>
              ) : null}
              <FreshSWR key={week.map((b) => b.id).join()}>
                <WeekView pressId={press.id} from={dayStarts[0]!.toISOString()} to={dayStarts[7]!.toISOString()} days={days} timeZone={zone} initial={week} />
              </FreshSWR>
            </Card>
          ) : null}
        </div>
      )}
    </>
  );
}
