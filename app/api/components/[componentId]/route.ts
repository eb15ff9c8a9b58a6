import { NextResponse, type NextRequest } from "next/server";
import { deleteComponent, getComponent, updateComponent } from "@/lib/data/components";
import { apiRoute, readJsonBody, requireApiSession } from "@/lib/http";
import { componentPatchSchema } from "@/lib/validation/press";

type Context = { params: Promise<{ componentId: string }> };

/** Edits a component's details or spec. Managers only; removed parts answer 409. */
export const PATCH = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { componentId } = await params;
  const patch = componentPatchSchema.parse(await readJsonBody(req));
  await updateComponent({ userId: current.user.id }, componentId, patch);
  return NextResponse.json({ component: await getComponent({ userId: current.user.id }, componentId) });
});

/** Deletes a part entered by mistake; parts with history answer 409. Managers only. */
export const DELETE = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { componentId } = await params;
  await deleteComponent({ userId: current.user.id }, componentId);
  return new NextResponse(null, { status: 204 });
});
