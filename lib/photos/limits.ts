/**
 * Upload limits for photos, shared by the upload route, the photo picker and the server pipeline.
 * Pure (no Node APIs), so client components can check a file before uploading it.
 */

/** 8 MB as the upload SDK counts it ("8MB" = 8 × 1024 × 1024 bytes), so both refuse the same files. */
export const MAX_PHOTO_BYTES = 8 * 1024 * 1024;
/** The same limit in the route config's notation. */
export const MAX_PHOTO_FILE_SIZE = "8MB";
export const MAX_PHOTOS_PER_UPLOAD = 10;

export const ALLOWED_PHOTO_TYPES = ["image/jpeg", "image/png", "image/webp"] as const;
export type AllowedPhotoType = (typeof ALLOWED_PHOTO_TYPES)[number];
/** For `<input type="file" accept=…>`. */
export const PHOTO_ACCEPT = ALLOWED_PHOTO_TYPES.join(",");

export function isAllowedPhotoType(type: string): type is AllowedPhotoType {
  return (ALLOWED_PHOTO_TYPES as readonly string[]).includes(type);
}

export type PhotoRejection = "empty" | "too-large" | "not-an-image" | "unsupported-format" | "too-many-pixels" | "damaged";

/** A photo we will not store; `message` is written for the person who uploaded it. */
export class PhotoRejectedError extends Error {
  override readonly name = "PhotoRejectedError";

  constructor(
    readonly reason: PhotoRejection,
    message: string,
  ) {
    super(message);
  }
}

const megabytes = (bytes: number): string => `${(bytes / (1024 * 1024)).toFixed(1)} MB`;

/** Throws PhotoRejectedError unless a file of this many bytes may be uploaded. */
export function checkUploadSize(byteLength: number): void {
  if (byteLength <= 0) throw new PhotoRejectedError("empty", "The file is empty.");
  if (byteLength > MAX_PHOTO_BYTES) {
    throw new PhotoRejectedError("too-large", `The photo is ${megabytes(byteLength)}; the limit is ${megabytes(MAX_PHOTO_BYTES)}.`);
  }
}
