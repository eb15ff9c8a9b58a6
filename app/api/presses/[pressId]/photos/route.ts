import { NextResponse, type NextRequest } from "next/server";
import { listPressPhotos } from "@/lib/data/photos";
import { apiRoute, requireApiSession } from "@/lib/http";
import { photoListQuerySchema } from "@/lib/validation/photo";

type Context = { params: Promise<{ pressId: string }> };

/** A press's photos, newest first; `?kind=weld` (leak, damage, die, other) narrows them. */
export const GET = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { pressId } = await params;
  const { kind } = photoListQuerySchema.parse(Object.fromEntries(req.nextUrl.searchParams));
  return NextResponse.json({ photos: await listPressPhotos({ userId: current.user.id }, pressId, { kind }) });
});
