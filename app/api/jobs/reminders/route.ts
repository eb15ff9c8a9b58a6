import { timingSafeEqual } from "node:crypto";
import { NextResponse, type NextRequest } from "next/server";
import { queueReminderDigests } from "@/lib/data/reminders";
import { JOB_SECRET_HEADER } from "@/lib/email/jobs";
import { apiRoute, jsonError } from "@/lib/http";


function secretMatches(given: string | null): boolean {
  const expected = process.env.JOBS_SECRET ?? "";
  if (expected.length < 16 || !given) return false;
  const a = Buffer.from(given);
  const b = Buffer.from(expected);
  return a.length === b.length && timingSafeEqual(a, b);
}

/**
 * Queues the daily reminder digests (a scheduler calls this; the start command does so on an
 * interval). 401 without the right secret; 503 when JOBS_SECRET is not configured.
 */
export const POST = apiRoute(
  async (req: NextRequest) => {
    if ((process.env.JOBS_SECRET ?? "").length < 16) return jsonError(503, "Jobs are not configured (JOBS_SECRET).");
    if (!secretMatches(req.headers.get(JOB_SECRET_HEADER))) return jsonError(401, "Wrong or missing job secret.");
    return NextResponse.json(await queueReminderDigests());
  },
  { csrf: false },
);
