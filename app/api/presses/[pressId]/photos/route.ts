import { NextResponse, type NextRequest } from "next/server";
import { countPressPhotos, listPressPhotos } from "@/lib/data/photos";
import { apiRoute, requireApiSession } from "@/lib/http";
import { photoListQuerySchema } from "@/lib/validation/photo";

type Context = { params: Promise<{ pressId: string }> };

/**
 * A press's photos, newest first, a page at a time (`nextCursor` → `?cursor=`); `?kind=weld`
 * (leak, damage, die, other) narrows them. The first page also carries the count of each kind.
 */
export const GET = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { pressId } = await params;
  const { kind, cursor, limit } = photoListQuerySchema.parse(Object.fromEntries(req.nextUrl.searchParams));
  const actor = { userId: current.user.id };
  const [page, counts] = await Promise.all([listPressPhotos(actor, pressId, { kind, cursor, limit }), cursor ? undefined : countPressPhotos(actor, pressId)]);
  return NextResponse.json({ ...page, ...(counts ? { counts } : {}) });
});
