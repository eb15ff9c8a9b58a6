import { NextResponse, type NextRequest } from "next/server";
import { replaceComponent } from "@/lib/data/components";
import { apiRoute, readJsonBody, requireApiSession } from "@/lib/http";
import { componentInputSchema, replaceComponentSchema } from "@/lib/validation/press";

type Context = { params: Promise<{ componentId: string }> };

/** Replaces a part in one transaction; the old one stays in the history. Managers only. */
export const POST = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { componentId } = await params;
  const body = replaceComponentSchema.parse(await readJsonBody(req));
  const replacement = componentInputSchema.parse(body.replacement);
  const { id } = await replaceComponent({ userId: current.user.id }, componentId, { ...body, replacement });
  return NextResponse.json({ id }, { status: 201 });
});
