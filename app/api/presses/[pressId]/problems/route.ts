import { NextResponse, type NextRequest } from "next/server";
import { listProblems, reportProblem } from "@/lib/data/problems";
import { apiRoute, requireApiSession, readJsonBody } from "@/lib/http";
import { problemInputSchema } from "@/lib/validation/shop-use";

type Context = { params: Promise<{ pressId: string }> };

/** `{ open, closed }`: every open report and the last ten closed. */
export const GET = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { pressId } = await params;
  return NextResponse.json(await listProblems({ userId: current.user.id }, pressId));
});

/** Reports `{ description, severity, stopUse? }`; `stopUse: true` tags the press out at once. */
export const POST = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { pressId } = await params;
  const input = problemInputSchema.parse(await readJsonBody(req));
  return NextResponse.json(await reportProblem({ userId: current.user.id }, pressId, input), { status: 201 });
});
