"use client";

import Image from "next/image";
import { useMemo, useState } from "react";
import useSWRInfinite from "swr/infinite";
import { fetchJson } from "@/lib/fetch-json";
import { PHOTO_KIND_LABELS, PHOTO_KIND_OPTIONS, type PhotoKind } from "@/lib/photos/kinds";
import { pressPhotosUrl, type PhotoItem } from "./photo-api";
import { PhotoUploader, type PartOption } from "./lazy-photo-uploader";
import { PhotoViewer } from "./photo-viewer";

export type GalleryPage = { photos: PhotoItem[]; nextCursor: string | null; counts?: Partial<Record<PhotoKind, number>> };

type Props = {
  pressId: string;
  /** The first page of all kinds, with the count of each kind. */
  initial: GalleryPage;
  currentUserId: string;
  /** Managers may edit and delete anyone's photos; the server decides either way. */
  canManage: boolean;
  /** Whether to offer the uploader (members of the shop, press not retired). */
  canAttach: boolean;
  parts?: PartOption[];
  /** Photo links expire (lib/photos/file-urls.ts): the pages shown are fetched again well before they do. */
  refreshMs: number;
};

/** The press page's photos, newest first a page at a time: upload, filter by kind, open one large, edit or delete it. */
export function PressGallery({ pressId, initial, currentUserId, canManage, canAttach, parts, refreshMs }: Props) {
  const [kind, setKind] = useState<PhotoKind | "all">("all");
  const [openId, setOpenId] = useState<string | null>(null);
  const base = `${pressPhotosUrl(pressId)}${kind === "all" ? "" : `?kind=${kind}`}`;
  const { data, error, mutate, size, setSize, isValidating } = useSWRInfinite<GalleryPage>(
    (index, previous: GalleryPage | null) => (index === 0 ? base : previous?.nextCursor ? `${base}${kind === "all" ? "?" : "&"}cursor=${previous.nextCursor}` : null),
    fetchJson<GalleryPage>,
    // Every page shown is refetched on refresh: older pages' links expire as well.
    { fallbackData: kind === "all" ? [initial] : undefined, refreshInterval: refreshMs, revalidateAll: true },
  );

  const shown = useMemo(() => (data ?? []).flatMap((p) => p.photos), [data]);
  const counts = data?.[0]?.counts ?? initial.counts ?? {};
  const total = Object.values(counts).reduce((sum, n) => sum + n, 0);
  const more = data?.at(-1)?.nextCursor != null;
  const open = shown.find((p) => p.id === openId) ?? null;
  const filters = [{ value: "all" as const, label: "All", count: total }, ...PHOTO_KIND_OPTIONS.map((o) => ({ ...o, count: counts[o.value] ?? 0 }))];

  return (
    <div className="flex flex-col gap-4">
      {canAttach ? <PhotoUploader target={{ pressId }} parts={parts} onUploaded={() => void mutate()} /> : null}

      <div role="group" aria-label="Show photos of kind" className="flex flex-wrap gap-2">
        {filters.map((f) => (
          <button
            key={f.value}
            type="button"
            aria-pressed={kind === f.value}
            onClick={() => setKind(f.value)}
            className="min-h-9 rounded-full px-3 text-sm font-medium ring-1 ring-steel-300 transition-colors hover:bg-steel-100 aria-pressed:bg-steel-800 aria-pressed:text-white aria-pressed:ring-steel-800"
          >
            {f.label} <span className="font-mono text-xs opacity-75">{f.count}</span>
          </button>
        ))}
      </div>

      {error ? (
        <p role="alert" className="text-sm text-fail">
          The photos could not be loaded: {error instanceof Error ? error.message : "unknown error"}.
        </p>
      ) : null}

      {shown.length === 0 ? (
        <p className="rounded-md border border-dashed border-steel-300 px-4 py-6 text-center text-sm text-steel-600">
          {!data && isValidating ? "Loading…" : total === 0 ? "No photos of this press yet." : `No ${PHOTO_KIND_LABELS[kind as PhotoKind].toLowerCase()} photos yet.`}
        </p>
      ) : (
        <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-4 xl:grid-cols-5" data-testid="photo-gallery">
          {shown.map((p) => (
            <li key={p.id}>
              <figure className="flex h-full flex-col overflow-hidden rounded-md bg-steel-50 ring-1 ring-steel-200">
                <button type="button" onClick={() => setOpenId(p.id)} className="block bg-steel-900" aria-label={`Open photo: ${p.caption ?? PHOTO_KIND_LABELS[p.kind]}`}>
                  <Image
                    src={p.thumbUrl}
                    alt={p.caption ?? `${PHOTO_KIND_LABELS[p.kind]} photo`}
                    width={p.thumbWidth}
                    height={p.thumbHeight}
                    sizes="(max-width: 640px) 50vw, (max-width: 1024px) 33vw, 240px"
                    // Thumbnails are small server-made JPEGs behind a session-checked link: served as they are.
                    unoptimized
                    className="aspect-[4/3] w-full object-cover transition-opacity hover:opacity-90"
                  />
                </button>
                <figcaption className="flex flex-1 flex-col gap-1 p-2 text-xs">
                  <span className="w-fit rounded bg-steel-200 px-1.5 py-0.5 font-semibold text-steel-800">{PHOTO_KIND_LABELS[p.kind]}</span>
                  {p.caption ? <span className="line-clamp-2 text-sm text-ink">{p.caption}</span> : null}
                  {p.componentLabel ? <span className="text-steel-600">Part: {p.componentLabel}</span> : null}
                </figcaption>
              </figure>
            </li>
          ))}
        </ul>
      )}

      {more ? (
        <button type="button" className="self-start text-sm text-oil-700 underline" onClick={() => void setSize(size + 1)} disabled={isValidating}>
          Show older photos
        </button>
      ) : null}

      <PhotoViewer
        photo={open}
        canChange={open ? canManage || open.uploadedBy === currentUserId : false}
        onClose={() => setOpenId(null)}
        onChanged={() => void mutate()}
      />
    </div>
  );
}
