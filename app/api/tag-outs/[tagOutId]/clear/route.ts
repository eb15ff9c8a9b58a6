import { NextResponse, type NextRequest } from "next/server";
import { clearTagOut } from "@/lib/data/press-tag-outs";
import { apiRoute, requireApiSession, readJsonBody } from "@/lib/http";
import { tagOutReasonSchema } from "@/lib/validation/inspection";

type Context = { params: Promise<{ tagOutId: string }> };

/** Clears an open tag-out with a recorded reason: `{ reason }`. Managers and inspectors. */
export const POST = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { tagOutId } = await params;
  const { reason } = tagOutReasonSchema.parse(await readJsonBody(req));
  return NextResponse.json(await clearTagOut({ userId: current.user.id }, tagOutId, reason));
});
