import type { PhotoView } from "@/lib/data/photos";
import type { PhotoPatch } from "@/lib/validation/photo";

/** A photo as the JSON API sends it. */
export type PhotoItem = Omit<PhotoView, "createdAt"> & { createdAt: string };

export const pressPhotosUrl = (pressId: string): string => `/api/presses/${pressId}/photos`;

/** PATCH or DELETE one photo; throws with the server's message when refused. */
export async function changePhoto(photoId: string, change: { patch: PhotoPatch } | { remove: true }): Promise<void> {
  const init: RequestInit =
    "patch" in change
      ? { method: "PATCH", headers: { "content-type": "application/json" }, body: JSON.stringify(change.patch) }
      : { method: "DELETE" };
  const res = await fetch(`/api/photos/${photoId}`, init);
  if (res.ok) return;
  const body = (await res.json().catch(() => null)) as { error?: string } | null;
  throw new Error(body?.error ?? `The change was not saved (${res.status}).`);
}
