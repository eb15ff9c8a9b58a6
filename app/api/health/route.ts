import { NextResponse } from "next/server";
import { pingDatabase } from "@/lib/data/health";
import { DATABASE_UNAVAILABLE_MESSAGE } from "@/lib/errors";

export const dynamic = "force-dynamic";

/** For load balancers: 200 when this instance can reach MariaDB, 503 otherwise. */
export async function GET(): Promise<NextResponse> {
  const up = await pingDatabase();
  return up
    ? NextResponse.json({ ok: true, database: "up" })
    : NextResponse.json({ ok: false, database: "down", error: DATABASE_UNAVAILABLE_MESSAGE }, { status: 503 });
}
