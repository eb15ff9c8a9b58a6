import type { NextRequest } from "next/server";
import { NotFoundError } from "@/lib/auth/permissions";
import { photoFileKey } from "@/lib/data/photos";
import { apiRoute, jsonError, requireApiSession } from "@/lib/http";
import { checkPhotoFileLink, isPhotoVariant } from "@/lib/photos/file-urls";
import { fetchStoredFile, StorageUnavailableError } from "@/lib/uploads/storage";

type Context = { params: Promise<{ photoId: string; variant: string }> };

/**
 * GET /photo-files/{photoId}/{full|thumb}?exp=…&sig=… — one photo file, streamed from private
 * storage. The link must be unexpired and signed by us (403 tampered, 410 expired), and the viewer
 * signed in (401) and a member of the photo's shop (404 otherwise). Cached only by the viewer's own
 * browser, until the link expires. Outside /api so the API's no-store rule does not apply.
 */
export const GET = apiRoute(async (req: NextRequest, { params }: Context) => {
  const { photoId, variant } = await params;
  if (!isPhotoVariant(variant)) throw new NotFoundError("Photo not found");
  const link = checkPhotoFileLink(photoId, variant, req.nextUrl.searchParams.get("exp"), req.nextUrl.searchParams.get("sig"));
  if (!link.ok && link.reason === "expired") return jsonError(410, "This photo link has expired. Reload the page for a fresh one.");
  if (!link.ok) return jsonError(403, "This photo link is not valid.");
  const current = await requireApiSession(req);
  const key = await photoFileKey({ userId: current.user.id }, photoId, variant);
  let stored: Response;
  try {
    stored = await fetchStoredFile(key);
  } catch (error) {
    if (error instanceof StorageUnavailableError) return jsonError(503, error.message, undefined, { headers: { "Retry-After": "5" } });
    throw error;
  }
  const headers = new Headers({
    "Content-Type": "image/jpeg",
    "Cache-Control": `private, max-age=${link.secondsLeft}`,
    "Content-Disposition": "inline",
    "X-Content-Type-Options": "nosniff",
  });
  const length = stored.headers.get("content-length");
  if (length) headers.set("Content-Length", length);
  return new Response(stored.body, { status: 200, headers });
});
