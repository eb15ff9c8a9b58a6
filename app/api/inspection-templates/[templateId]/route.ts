import { NextResponse, type NextRequest } from "next/server";
import { getTemplate, updateTemplate } from "@/lib/data/inspection-templates";
import { apiRoute, requireApiSession, readJsonBody } from "@/lib/http";
import { templateInputSchema } from "@/lib/validation/inspection";

type Context = { params: Promise<{ templateId: string }> };

export const GET = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { templateId } = await params;
  const { role: _role, ...template } = await getTemplate({ userId: current.user.id }, templateId);
  return NextResponse.json(template);
});

/** Replaces a checklist's name, cadence and items (managers). Runs already started keep their snapshot. */
export const PUT = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { templateId } = await params;
  const input = templateInputSchema.parse(await readJsonBody(req));
  await updateTemplate({ userId: current.user.id }, templateId, input);
  return NextResponse.json({ ok: true });
});
