import { NextResponse, type NextRequest } from "next/server";
import { deletePhoto, getPhoto, updatePhoto } from "@/lib/data/photos";
import { apiRoute, readJsonBody, jsonError, requireApiSession } from "@/lib/http";
import { StorageUnavailableError } from "@/lib/uploads/storage";
import { photoPatchSchema } from "@/lib/validation/photo";

type Context = { params: Promise<{ photoId: string }> };

/** One photo. Members of its press's shop; anyone else gets 404. */
export const GET = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { photoId } = await params;
  return NextResponse.json({ photo: await getPhoto({ userId: current.user.id }, photoId) });
});

/** Changes the caption or kind. Its uploader or a manager. */
export const PATCH = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { photoId } = await params;
  const patch = photoPatchSchema.parse(await readJsonBody(req));
  return NextResponse.json({ photo: await updatePhoto({ userId: current.user.id }, photoId, patch) });
});

/** Deletes the photo and its stored files. Its uploader or a manager; 503 while storage is unreachable. */
export const DELETE = apiRoute(async (req: NextRequest, { params }: Context) => {
  const current = await requireApiSession(req);
  const { photoId } = await params;
  try {
    await deletePhoto({ userId: current.user.id }, photoId);
  } catch (error) {
    if (error instanceof StorageUnavailableError) return jsonError(503, error.message, undefined, { headers: { "Retry-After": "5" } });
    throw error;
  }
  return new NextResponse(null, { status: 204 });
});
