import type { PHOTO_KINDS } from "@/db/schema/photos";

/** What a photo shows. Client-safe: the list is typed against the schema without importing it. */
export type PhotoKind = (typeof PHOTO_KINDS)[number];

export const PHOTO_KIND_LABELS: Record<PhotoKind, string> = {
  weld: "Weld",
  leak: "Leak",
  damage: "Damage",
  die: "Die",
  other: "Other",
};

export const PHOTO_KIND_OPTIONS: readonly { value: PhotoKind; label: string }[] = (Object.keys(PHOTO_KIND_LABELS) as PhotoKind[]).map((value) => ({
  value,
  label: PHOTO_KIND_LABELS[value],
}));

export const MAX_CAPTION_LENGTH = 200;
