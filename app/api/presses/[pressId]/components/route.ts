import { NextResponse, type NextRequest } from "next/server";
import { createComponent, listComponents } from "@/lib/data/components";
import { apiRoute, readJsonBody, requireApiSession } from "@/lib/http";
import { componentInputSchema } from "@/lib/validation/press";

type Context = { params: Promise<{ pressId: string }> };

/** Components of a press; `?include=removed` adds the replaced and removed ones (history). */
export const GET = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { pressId } = await params;
  const includeRemoved = req.nextUrl.searchParams.get("include") === "removed";
  return NextResponse.json({ components: await listComponents({ userId: current.user.id }, pressId, { includeRemoved }) });
});

/** Adds a component (SI spec validated against its kind). Managers only. */
export const POST = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { pressId } = await params;
  const input = componentInputSchema.parse(await readJsonBody(req));
  const { id } = await createComponent({ userId: current.user.id }, pressId, input);
  return NextResponse.json({ id }, { status: 201 });
});
