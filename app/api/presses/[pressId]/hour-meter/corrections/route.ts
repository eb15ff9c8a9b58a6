import { NextResponse, type NextRequest } from "next/server";
import { correctHourMeter } from "@/lib/data/press-edits";
import { apiRoute, readJsonBody, requireApiSession } from "@/lib/http";
import { hourCorrectionSchema } from "@/lib/validation/press";

type Context = { params: Promise<{ pressId: string }> };

/**
 * A manager corrects a wrong reading: `{ hours, reason }`. Readings above `hours` are voided (kept
 * in the history); 409 when the value does not fit the readings that stay. Managers only.
 */
export const POST = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { pressId } = await params;
  const input = hourCorrectionSchema.parse(await readJsonBody(req));
  await correctHourMeter({ userId: current.user.id }, pressId, input);
  return NextResponse.json({ ok: true }, { status: 201 });
});
