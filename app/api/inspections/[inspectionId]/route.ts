import { NextResponse, type NextRequest } from "next/server";
import { getInspection, updateAnswers } from "@/lib/data/inspections";
import { apiRoute, requireApiSession, readJsonBody } from "@/lib/http";
import { answerPatchSchema } from "@/lib/validation/inspection";

type Context = { params: Promise<{ inspectionId: string }> };

export const GET = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { inspectionId } = await params;
  return NextResponse.json(await getInspection({ userId: current.user.id }, inspectionId));
});

/**
 * Answers while unsigned: `{ answers: [{ opKey, itemKey, outcome, note? }] }`, applied in order,
 * each `opKey` at most once. Signed: 409.
 */
export const PATCH = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { inspectionId } = await params;
  const patch = answerPatchSchema.parse(await readJsonBody(req));
  return NextResponse.json(await updateAnswers({ userId: current.user.id }, inspectionId, patch));
});
