import "server-only";
import { UTApi, UTFile } from "uploadthing/server";

/** A file we put in upload storage, as the photo rows record it. */
export type StoredFile = { key: string; url: string };

/** The upload service's API. The SDK reads UPLOADTHING_* from the environment at each call. */
let api: UTApi | null = null;
function utapi(): UTApi {
  api ??= new UTApi();
  return api;
}

/** Raised when the upload service cannot be reached or refuses a call; nothing is half-done by us. */
export class StorageUnavailableError extends Error {
  constructor(action: string, options?: { cause?: unknown }) {
    super(`The photo storage could not ${action}. Please try again in a moment.`, options);
    this.name = "StorageUnavailableError";
  }
}

/**
 * Stores JPEGs the server made. Every file that did get stored is reported through `onStored`
 * before an error is thrown, so the caller can delete it again.
 */
export async function storeJpegs(files: { name: string; data: Buffer }[], onStored: (key: string) => void): Promise<StoredFile[]> {
  let results;
  try {
    // Private: the service serves them only through signed URLs, which only the app hands out.
    results = await utapi().uploadFiles(
      files.map((f) => new UTFile([new Uint8Array(f.data)], f.name, { type: "image/jpeg" })),
      { acl: "private" },
    );
  } catch (cause) {
    throw new StorageUnavailableError("store the photo", { cause });
  }
  const stored: StoredFile[] = [];
  for (const result of results) {
    if (result.data) {
      onStored(result.data.key);
      stored.push({ key: result.data.key, url: result.data.ufsUrl });
    }
  }
  const failed = results.find((r) => r.error);
  if (failed?.error) throw new StorageUnavailableError("store the photo", { cause: failed.error });
  return stored;
}

/** Lifetime of a storage URL the server signs for itself (never handed to a browser). */
const SERVER_FETCH_URL_TTL_S = 60;

/**
 * Fetches a stored file through a short-lived signed URL (files are private). Signing needs no
 * request to the service. Throws StorageUnavailableError when the service does not answer 2xx.
 */
export async function fetchStoredFile(key: string): Promise<Response> {
  let res: Response;
  try {
    const { ufsUrl } = await utapi().generateSignedURL(key, { expiresIn: SERVER_FETCH_URL_TTL_S });
    res = await fetch(ufsUrl);
  } catch (cause) {
    throw new StorageUnavailableError("read the photo", { cause });
  }
  if (!res.ok) throw new StorageUnavailableError("read the photo", { cause: `GET ${key}: ${res.status}` });
  return res;
}

/** Deletes stored files; throws StorageUnavailableError when the service does not confirm it. */
export async function deleteStoredFiles(keys: string[]): Promise<void> {
  if (keys.length === 0) return;
  let result;
  try {
    result = await utapi().deleteFiles(keys);
  } catch (cause) {
    throw new StorageUnavailableError("delete the photo files", { cause });
  }
  if (!result.success) throw new StorageUnavailableError("delete the photo files");
}

/** Clean-up after a failure: never throws, but logs the keys it could not delete so they can be found. */
export async function deleteStoredFilesQuietly(keys: string[]): Promise<void> {
  try {
    await deleteStoredFiles(keys);
  } catch (error) {
    console.error("[uploads] could not delete stored files", keys, error);
  }
}
