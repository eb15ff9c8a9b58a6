import "server-only";
import { ForbiddenError, NotFoundError } from "@/lib/auth/permissions";
import { createPhotoRecord, type PhotoTarget, type StoredImage } from "@/lib/data/photos";
import { ConflictError } from "@/lib/errors";
import { newId } from "@/lib/ids";
import { deleteStoredFiles, deleteStoredFilesQuietly, fetchStoredFile, StorageUnavailableError, storeJpegs } from "@/lib/uploads/storage";
import type { PhotoKind } from "./kinds";
import { checkUploadSize, PhotoRejectedError } from "./limits";
import { processPhoto, type EncodedPhoto } from "./pipeline";

/** What the upload route's middleware verified; it comes back signed with the upload service's callback. */
export type PhotoUploadMetadata = PhotoTarget & { userId: string; kind: PhotoKind; caption: string | null };
/** The upload's server data, shown to the uploader: the new photo, or why there is none. */
export type PhotoUploadResult = { photoId: string } | { error: string };

const FAILED = "The photo could not be stored. Please try again.";

async function fetchOriginal(key: string, declaredSize: number): Promise<Uint8Array> {
  checkUploadSize(declaredSize);
  const res = await fetchStoredFile(key);
  const length = Number(res.headers.get("content-length") ?? 0);
  if (length) checkUploadSize(length);
  const bytes = new Uint8Array(await res.arrayBuffer());
  checkUploadSize(bytes.byteLength);
  return bytes;
}

function messageFor(error: unknown): string {
  if (error instanceof PhotoRejectedError || error instanceof StorageUnavailableError || error instanceof ConflictError) return error.message;
  if (error instanceof NotFoundError || error instanceof ForbiddenError) return "You can no longer add photos to this press.";
  console.error("[photos] upload pipeline failed", error);
  return FAILED;
}

const stored = (file: { key: string; url: string }, encoded: EncodedPhoto): StoredImage => ({
  ...file,
  width: encoded.width,
  height: encoded.height,
  bytes: encoded.bytes,
});

/**
 * The server half of a photo upload (issue 5): fetch the original the browser stored, re-encode it
 * without metadata (lib/photos/pipeline), store the full image and thumbnail, delete the original,
 * then record the row. Any failure deletes every file stored so far and records nothing, so a
 * photo is either complete and listed or gone. Never throws: the SDK would leave the browser
 * waiting for a result, so failures come back as `{ error }` for the uploader.
 */
export async function storeUploadedPhoto(
  metadata: PhotoUploadMetadata,
  original: { key: string; ufsUrl: string; size: number },
): Promise<PhotoUploadResult> {
  const toDelete = new Set([original.key]);
  try {
    const processed = await processPhoto(await fetchOriginal(original.key, original.size));
    const id = newId();
    const [full, thumb] = await storeJpegs(
      [
        { name: `${id}.jpg`, data: processed.full.data },
        { name: `${id}-thumb.jpg`, data: processed.thumb.data },
      ],
      (key) => toDelete.add(key),
    );
    if (!full || !thumb) throw new StorageUnavailableError("store the photo");
    await deleteStoredFiles([original.key]);
    toDelete.delete(original.key);
    const { userId, pressId, componentId, serviceEntryId, problemReportId, inspectionItemId, kind, caption } = metadata;
    await createPhotoRecord(
      { userId },
      { pressId, componentId, serviceEntryId, problemReportId, inspectionItemId },
      { id, kind, caption, full: stored(full, processed.full), thumb: stored(thumb, processed.thumb) },
    );
    return { photoId: id };
  } catch (error) {
    await deleteStoredFilesQuietly([...toDelete]);
    return { error: messageFor(error) };
  }
}
