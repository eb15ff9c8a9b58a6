"use client";

import Image from "next/image";
import { useRouter } from "next/navigation";
import { PhotoUploader } from "@/components/photos/lazy-photo-uploader";
import { PHOTO_KIND_LABELS } from "@/lib/photos/kinds";

type Photo = { id: string; url: string; thumbUrl: string; thumbWidth: number; thumbHeight: number; caption: string | null; kind: keyof typeof PHOTO_KIND_LABELS };

/** Photos of one service entry (e.g. the leak before and after), with the shared uploader. */
export function EntryPhotos({ pressId, entryId, photos, canAttach }: { pressId: string; entryId: string; photos: Photo[]; canAttach: boolean }) {
  const router = useRouter();
  return (
    <div className="flex flex-col gap-4">
      {photos.length === 0 ? (
        <p className="text-sm text-steel-600">No photos of this work yet.</p>
      ) : (
        <ul className="grid grid-cols-2 gap-3 sm:grid-cols-4" data-testid="entry-photos">
          {photos.map((p) => (
            <li key={p.id}>
              <a href={p.url} target="_blank" rel="noreferrer" className="block overflow-hidden rounded-md ring-1 ring-steel-200">
                <Image src={p.thumbUrl} alt={p.caption ?? `${PHOTO_KIND_LABELS[p.kind]} photo`} width={p.thumbWidth} height={p.thumbHeight} sizes="(max-width: 640px) 50vw, 200px" className="aspect-[4/3] w-full object-cover" />
              </a>
              {p.caption ? <p className="mt-1 text-xs">{p.caption}</p> : null}
            </li>
          ))}
        </ul>
      )}
      {canAttach ? <PhotoUploader target={{ pressId, serviceEntryId: entryId }} onUploaded={() => router.refresh()} /> : null}
    </div>
  );
}
