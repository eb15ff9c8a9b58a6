import { NextResponse, type NextRequest } from "next/server";
import { listPressInspections } from "@/lib/data/inspection-lists";
import { startInspection } from "@/lib/data/inspections";
import { apiRoute, requireApiSession, readJsonBody } from "@/lib/http";
import { pageQuerySchema, startInspectionSchema } from "@/lib/validation/inspection";

type Context = { params: Promise<{ pressId: string }> };

/** A press's inspections, newest first; `?cursor=` from `nextCursor` for the next page. */
export const GET = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { pressId } = await params;
  const { cursor } = pageQuerySchema.parse(Object.fromEntries(req.nextUrl.searchParams));
  return NextResponse.json(await listPressInspections({ userId: current.user.id }, pressId, { cursor }));
});

/** Starts an inspection from one of the shop's checklists: `{ templateId }`. */
export const POST = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { pressId } = await params;
  const { templateId } = startInspectionSchema.parse(await readJsonBody(req));
  const { id } = await startInspection({ userId: current.user.id }, pressId, templateId);
  return NextResponse.json({ id }, { status: 201, headers: { Location: `/api/inspections/${id}` } });
});
