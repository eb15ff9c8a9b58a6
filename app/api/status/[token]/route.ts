import { NextResponse, type NextRequest } from "next/server";
import { getPublicStatus } from "@/lib/data/status-page";
import { apiRoute } from "@/lib/http";

type Context = { params: Promise<{ token: string }> };

/** Public: a press's status and free time today and tomorrow, for whoever holds the link. No personal data. */
export const GET = apiRoute(async (_req: NextRequest, { params }: Context) => {
  const { token } = await params;
  const { pressId, ...status } = await getPublicStatus(token);
  void pressId; // never published: the token is the only handle on the press
  return NextResponse.json(status, { headers: { "cache-control": "no-store" } });
});
