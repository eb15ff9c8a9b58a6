import { NextResponse, type NextRequest } from "next/server";
import { closeProblem } from "@/lib/data/problems";
import { apiRoute, requireApiSession, readJsonBody } from "@/lib/http";
import { problemCloseSchema } from "@/lib/validation/shop-use";

type Context = { params: Promise<{ problemId: string }> };

/** Closes a report: `{ close: true, serviceEntryId? , reason? }` (one of the two); managers and inspectors. */
export const PATCH = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { problemId } = await params;
  const input = problemCloseSchema.parse(await readJsonBody(req));
  await closeProblem({ userId: current.user.id }, problemId, input);
  return NextResponse.json({ ok: true });
});
