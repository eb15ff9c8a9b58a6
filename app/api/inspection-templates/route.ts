import { NextResponse, type NextRequest } from "next/server";
import { z } from "zod";
import { createTemplate, listTemplates } from "@/lib/data/inspection-templates";
import { apiRoute, requireApiSession, readJsonBody } from "@/lib/http";
import { ID_PATTERN } from "@/lib/ids";
import { templateInputSchema } from "@/lib/validation/inspection";

const shopQuery = z.strictObject({ shopId: z.string().regex(ID_PATTERN, "Not a valid shop id.") });

/** A shop's checklists: `?shopId=`. Any member. */
export const GET = apiRoute(async (req: NextRequest) => {
  const current = await requireApiSession(req);
  const { shopId } = shopQuery.parse(Object.fromEntries(req.nextUrl.searchParams));
  return NextResponse.json({ templates: await listTemplates({ userId: current.user.id }, shopId) });
});

/** A new checklist for `?shopId=`: `{ name, cadence, items: [...] }`. Managers. */
export const POST = apiRoute(async (req: NextRequest) => {
  const current = await requireApiSession(req);
  const { shopId } = shopQuery.parse(Object.fromEntries(req.nextUrl.searchParams));
  const input = templateInputSchema.parse(await readJsonBody(req));
  return NextResponse.json(await createTemplate({ userId: current.user.id }, shopId, input), { status: 201 });
});
