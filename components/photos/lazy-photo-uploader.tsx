"use client";

import dynamic from "next/dynamic";

export type { PartOption, PhotoTarget } from "./photo-uploader";

/**
 * The uploader, loaded after the page is interactive: the upload SDK is the largest script on the
 * press, service-entry and inspection-run pages, and nobody needs it before they pick a photo.
 * Use this one on pages; photo-uploader.tsx holds the component itself.
 */
export const PhotoUploader = dynamic(() => import("./photo-uploader").then((m) => m.PhotoUploader), {
  ssr: false,
  loading: () => <p className="text-sm text-steel-600">Loading the photo picker…</p>,
});
