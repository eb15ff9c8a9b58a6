import type { FRAME_TYPES, LIFECYCLES } from "@/db/schema/presses";

export const FRAME_TYPE_LABELS: Record<(typeof FRAME_TYPES)[number], string> = {
  "h-frame": "H-frame",
  "c-frame": "C-frame",
  "four-post": "Four-post",
  other: "Other frame",
};

export const LIFECYCLE_LABELS: Record<(typeof LIFECYCLES)[number], string> = {
  planned: "Planned",
  building: "Being built",
  "in-service": "In service",
  retired: "Retired",
};
