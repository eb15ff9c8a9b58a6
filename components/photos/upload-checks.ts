import { checkUploadSize, isAllowedPhotoType, MAX_PHOTO_BYTES, MAX_PHOTOS_PER_UPLOAD, PhotoRejectedError } from "@/lib/photos/limits";

export const formatBytes = (bytes: number): string =>
  bytes >= 1024 * 1024 ? `${(bytes / (1024 * 1024)).toFixed(1)} MB` : `${Math.max(1, Math.round(bytes / 1024))} kB`;

const WRONG_TYPE = "is not a JPEG, PNG or WebP photo. On an iPhone, set Settings › Camera › Formats to “Most Compatible”.";

/**
 * The checks the server makes on declared type, size and count, made before anything is sent so
 * the uploader hears at once what will be refused. The server still decides (and checks content).
 */
export function checkPhotoFiles(files: File[]): { accepted: File[]; problems: string[] } {
  const accepted: File[] = [];
  const problems: string[] = [];
  for (const file of files) {
    if (!isAllowedPhotoType(file.type)) {
      problems.push(`${file.name} ${WRONG_TYPE}`);
      continue;
    }
    try {
      checkUploadSize(file.size);
    } catch (error) {
      if (!(error instanceof PhotoRejectedError)) throw error;
      problems.push(`${file.name}: ${error.message}`);
      continue;
    }
    accepted.push(file);
  }
  if (accepted.length > MAX_PHOTOS_PER_UPLOAD) {
    problems.push(`Upload at most ${MAX_PHOTOS_PER_UPLOAD} photos at a time; the first ${MAX_PHOTOS_PER_UPLOAD} are kept.`);
    accepted.length = MAX_PHOTOS_PER_UPLOAD;
  }
  return { accepted, problems };
}

/** Turns the upload SDK's technical messages into what the uploader can act on; ours pass through. */
export function explainUploadError(message: string): string {
  if (message.includes("FileSizeMismatch")) return `A photo is larger than ${formatBytes(MAX_PHOTO_BYTES)}.`;
  if (message.includes("InvalidFileType") || message.includes("FileCountMismatch")) return `Upload JPEG, PNG or WebP photos, at most ${MAX_PHOTOS_PER_UPLOAD} at a time.`;
  if (message.startsWith("XHR failed") || message.includes("Failed to fetch")) return "The upload was interrupted. Check the connection and try again.";
  if (message.startsWith("Failed to run middleware") || message.includes("Something went wrong")) return "The upload could not be started. Please try again.";
  return message;
}
