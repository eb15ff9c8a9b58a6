import { NextResponse, type NextRequest } from "next/server";
import { applyStartingPlan, createServiceTask, getServicePlan } from "@/lib/data/service-plan";
import { apiRoute, requireApiSession, readJsonBody } from "@/lib/http";
import { parsePlanPost } from "@/lib/validation/service";

type Context = { params: Promise<{ pressId: string }> };

/** `{ tasks, timeZone, today }`: each task with where it stands (`due`), most urgent first. Members of the shop. */
export const GET = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { pressId } = await params;
  return NextResponse.json(await getServicePlan({ userId: current.user.id }, pressId));
});

/** Adds a task, or `{ "startingPlan": true }` for the common-practice plan (409 if a plan exists). Managers. */
export const POST = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const actor = { userId: current.user.id };
  const { pressId } = await params;
  const body = parsePlanPost(await readJsonBody(req));
  const result = "startingPlan" in body ? await applyStartingPlan(actor, pressId) : await createServiceTask(actor, pressId, body);
  return NextResponse.json(result, { status: 201 });
});
