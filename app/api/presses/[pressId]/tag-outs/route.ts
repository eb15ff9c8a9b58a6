import { NextResponse, type NextRequest } from "next/server";
import { listPressTagOuts, tagOutPressByHand } from "@/lib/data/press-tag-outs";
import { apiRoute, requireApiSession, readJsonBody } from "@/lib/http";
import { tagOutReasonSchema } from "@/lib/validation/inspection";

type Context = { params: Promise<{ pressId: string }> };

/** Open tag-outs of the press. */
export const GET = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { pressId } = await params;
  return NextResponse.json({ tagOuts: await listPressTagOuts({ userId: current.user.id }, pressId) });
});

/** Tags the press out by hand: `{ reason }`. Managers and inspectors. */
export const POST = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { pressId } = await params;
  const { reason } = tagOutReasonSchema.parse(await readJsonBody(req));
  return NextResponse.json(await tagOutPressByHand({ userId: current.user.id }, pressId, reason), { status: 201 });
});
