"use client";

import Image from "next/image";
import { useMemo, useState } from "react";
import useSWR from "swr";
import { fetchJson } from "@/lib/fetch-json";
import { PHOTO_KIND_LABELS, PHOTO_KIND_OPTIONS, type PhotoKind } from "@/lib/photos/kinds";
import { pressPhotosUrl, type PhotoItem } from "./photo-api";
import { PhotoUploader, type PartOption } from "./photo-uploader";
import { PhotoViewer } from "./photo-viewer";

type Props = {
  pressId: string;
  initial: PhotoItem[];
  currentUserId: string;
  /** Managers may edit and delete anyone's photos; the server decides either way. */
  canManage: boolean;
  /** Whether to offer the uploader (members of the shop, press not retired). */
  canAttach: boolean;
  parts?: PartOption[];
  /** Photo links expire (lib/photos/file-urls.ts): the list is fetched again well before they do. */
  refreshMs: number;
};

/** The press page's photos: upload, filter by kind, open one large, edit or delete it. */
export function PressGallery({ pressId, initial, currentUserId, canManage, canAttach, parts, refreshMs }: Props) {
  const url = pressPhotosUrl(pressId);
  const { data, error, mutate } = useSWR<{ photos: PhotoItem[] }>(url, fetchJson, { fallbackData: { photos: initial }, refreshInterval: refreshMs });
  const [kind, setKind] = useState<PhotoKind | "all">("all");
  const [openId, setOpenId] = useState<string | null>(null);

  const all = useMemo(() => data?.photos ?? [], [data]);
  const counts = useMemo(() => {
    const byKind = new Map<PhotoKind, number>();
    for (const p of all) byKind.set(p.kind, (byKind.get(p.kind) ?? 0) + 1);
    return byKind;
  }, [all]);
  const shown = kind === "all" ? all : all.filter((p) => p.kind === kind);
  const open = all.find((p) => p.id === openId) ?? null;
  const filters = [{ value: "all" as const, label: "All", count: all.length }, ...PHOTO_KIND_OPTIONS.map((o) => ({ ...o, count: counts.get(o.value) ?? 0 }))];

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
          {all.length === 0 ? "No photos of this press yet." : `No ${PHOTO_KIND_LABELS[kind as PhotoKind].toLowerCase()} photos yet.`}
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

      <PhotoViewer
        photo={open}
        canChange={open ? canManage || open.uploadedBy === currentUserId : false}
        onClose={() => setOpenId(null)}
        onChanged={() => void mutate()}
      />
    </div>
  );
}
