import type { Metadata } from "next";
import { BookingForm } from "@/components/booking/booking-form";
import { ProblemForm } from "@/components/problems/problem-form";
import { LiveStatus } from "@/components/status/live-status";
import { Card } from "@/components/ui/card";
import { FreshSWR } from "@/components/ui/fresh-swr";
import { getCurrentSession, orPageError } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { getPress } from "@/lib/data/presses";
import { getPublicStatus } from "@/lib/data/status-page";
import { localDate } from "@/lib/time-zone";
import { reportProblemAction } from "@/app/(app)/presses/[pressId]/problem-actions";

export const metadata: Metadata = { title: "Press status", robots: { index: false, follow: false } };

/**
 * The page behind the QR card on a press: anyone with the link sees the status and free time (no
 * personal data); a signed-in member of the press's shop can also book it and report a problem here.
 */
export default async function StatusPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const { pressId, ...status } = await orPageError(getPublicStatus(token));
  const session = await getCurrentSession();
  const member = session ? await getPress({ userId: session.user.id }, pressId).catch(() => null) : null;
  return (
    <div className="mx-auto flex max-w-2xl flex-col gap-4 px-4 py-6">
      <h1 className="text-2xl font-semibold tracking-tight">{status.pressName}</h1>
      <Card>
        {/* Keyed by the render time: after a report on this page, the fresh server data replaces SWR's older copy. */}
        <FreshSWR key={status.checkedAt}>
          <LiveStatus token={token} initial={status} />
        </FreshSWR>
      </Card>
      {member && status.status.usable && can(member.role, "bookPress") ? (
        <Card title="Book this press">
          <BookingForm presses={[{ id: pressId, name: member.name }]} today={localDate(new Date(), status.timeZone)} timeZone={status.timeZone} />
        </Card>
      ) : null}
      {member && member.lifecycle !== "retired" ? (
        <Card title="Report a problem">
          <ProblemForm pressId={pressId} action={reportProblemAction.bind(null, pressId)} />
        </Card>
      ) : null}
      {!session ? <p className="text-sm text-steel-600">Members of this shop can sign in to book the press or report a problem.</p> : null}
    </div>
  );
}
