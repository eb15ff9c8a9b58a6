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
const SERVER_URL_TTL_S = 10 * 60;
/** A cached URL is reused while it has at least this long left. */
const SERVER_URL_MIN_LEFT_MS = 60_000;
const SERVER_URL_CACHE_SIZE = 2000;
const signedUrls = new Map<string, { url: string; until: number }>();

/**
 * The SDK's signing costs about a millisecond of CPU (more under load) although it makes no
 * request, and a gallery asks for many files: URLs are cached per key, in this process only.
 */
async function serverSignedUrl(key: string, now = Date.now()): Promise<string> {
  const cached = signedUrls.get(key);
  if (cached && cached.until - now >= SERVER_URL_MIN_LEFT_MS) return cached.url;
  const { ufsUrl } = await utapi().generateSignedURL(key, { expiresIn: SERVER_URL_TTL_S });
  signedUrls.delete(key);
  signedUrls.set(key, { url: ufsUrl, until: now + SERVER_URL_TTL_S * 1000 });
  // Oldest first (Map keeps insertion order): a bounded cache whatever the number of photos.
  if (signedUrls.size > SERVER_URL_CACHE_SIZE) signedUrls.delete(signedUrls.keys().next().value!);
  return ufsUrl;
}

/**
 * Fetches a stored file through a signed URL (files are private). Throws StorageUnavailableError
 * when the service does not answer 2xx.
 */
export async function fetchStoredFile(key: string): Promise<Response> {
  let res: Response;
  try {
    res = await fetch(await serverSignedUrl(key));
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
