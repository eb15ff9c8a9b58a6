import { NextResponse, type NextRequest } from "next/server";
import { listHourReadings, recordHourMeter } from "@/lib/data/press-edits";
import { apiRoute, readJsonBody, requireApiSession } from "@/lib/http";
import { hourReadingSchema } from "@/lib/validation/press";

type Context = { params: Promise<{ pressId: string }> };

export const GET = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { pressId } = await params;
  return NextResponse.json({ readings: await listHourReadings({ userId: current.user.id }, pressId) });
});

/** Records a reading; lower than the last one, or higher than the time since it allows, answers 409. Any member of the shop. */
export const POST = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { pressId } = await params;
  const input = hourReadingSchema.parse(await readJsonBody(req));
  await recordHourMeter({ userId: current.user.id }, pressId, input);
  return NextResponse.json({ ok: true }, { status: 201 });
});
