import "server-only";
import type { NextRequest } from "next/server";
import { createUploadthing, type FileRouter } from "uploadthing/next";
import { UploadThingError } from "uploadthing/server";
import type { z } from "zod";
import { ForbiddenError, NotFoundError } from "@/lib/auth/permissions";
import { authorizePhotoTarget } from "@/lib/data/photos";
import { ConflictError } from "@/lib/errors";
import { apiSession } from "@/lib/http";
import { MAX_PHOTO_FILE_SIZE, MAX_PHOTOS_PER_UPLOAD } from "@/lib/photos/limits";
import { storeUploadedPhoto, type PhotoUploadMetadata } from "@/lib/photos/store-upload";
import { photoUploadInputSchema } from "@/lib/validation/photo";

const f = createUploadthing();

// The SDK counts files per type, so the total per upload is checked again in the middleware.
// Originals are private too: only the server reads them (through a signed URL), then deletes them.
const eachType = { maxFileSize: MAX_PHOTO_FILE_SIZE, maxFileCount: MAX_PHOTOS_PER_UPLOAD, acl: "private" } as const;

type PhotoInput = z.output<typeof photoUploadInputSchema>;

/**
 * Runs before any upload URL is signed: who is asking, and may they attach photos to this record?
 * The metadata returned here is what onUploadComplete receives (signed by the upload service), so
 * ids from the client are only ever used after this check.
 */
async function authorizeUpload(req: NextRequest, input: PhotoInput, fileCount: number): Promise<PhotoUploadMetadata> {
  if (fileCount > MAX_PHOTOS_PER_UPLOAD) {
    throw new UploadThingError({ code: "TOO_MANY_FILES", message: `Upload at most ${MAX_PHOTOS_PER_UPLOAD} photos at a time.` });
  }
  const current = await apiSession(req);
  if (!current) throw new UploadThingError({ code: "FORBIDDEN", message: "Sign in first." });
  try {
    const target = await authorizePhotoTarget({ userId: current.user.id }, input);
    return { ...target, userId: current.user.id, kind: input.kind, caption: input.caption ?? null };
  } catch (error) {
    if (error instanceof NotFoundError) throw new UploadThingError({ code: "NOT_FOUND", message: error.message });
    if (error instanceof ForbiddenError) throw new UploadThingError({ code: "FORBIDDEN", message: "Your role in this shop does not allow adding photos." });
    if (error instanceof ConflictError) throw new UploadThingError({ code: "BAD_REQUEST", message: error.message });
    throw error;
  }
}

/** Upload routes. One for now: photos of a press, or of one of its parts or problem reports. */
export const uploadRouter = {
  pressPhoto: f({ "image/jpeg": eachType, "image/png": eachType, "image/webp": eachType })
    .input(photoUploadInputSchema)
    .middleware(({ req, input, files }) => authorizeUpload(req, input, files.length))
    .onUploadComplete(({ metadata, file }) => storeUploadedPhoto(metadata, file)),
} satisfies FileRouter;

export type UploadRouter = typeof uploadRouter;
