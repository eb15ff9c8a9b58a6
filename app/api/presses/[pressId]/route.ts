import { NextResponse, type NextRequest } from "next/server";
import { updatePress } from "@/lib/data/press-edits";
import { getPress } from "@/lib/data/presses";
import { apiRoute, readJsonBody, requireApiSession } from "@/lib/http";
import { pressPatchSchema } from "@/lib/validation/press";

type Context = { params: Promise<{ pressId: string }> };

/** One press; another shop's press (or an unknown id) is 404. */
export const GET = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { pressId } = await params;
  const { role: _role, ...press } = await getPress({ userId: current.user.id }, pressId);
  return NextResponse.json({ press });
});

/** Edits a press (SI fields, strict). Managers only; a retired press answers 409. */
export const PATCH = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { pressId } = await params;
  const patch = pressPatchSchema.parse(await readJsonBody(req));
  await updatePress({ userId: current.user.id }, pressId, patch);
  const { role: _role, ...press } = await getPress({ userId: current.user.id }, pressId);
  return NextResponse.json({ press });
});
