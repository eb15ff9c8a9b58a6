import type { ServiceKind } from "@/db/schema/service";

/**
 * The plan offered to a press that has none. Common practice for small shop presses, not a
 * published standard (hydraulics-reference §7: filter and oil by hours or months, whichever first;
 * §10: relief setting checked monthly). The figures are our own starting points, chosen from
 * memory; the page marks them as such and the manager adjusts them to the component makers' manuals.
 */
export const STARTING_PLAN: readonly { title: string; kind: ServiceKind; intervalDays: number | null; intervalHours: number | null }[] = [
  { title: "Change the filter element", kind: "filter-changed", intervalDays: 180, intervalHours: 250 },
  { title: "Take an oil sample", kind: "oil-sample", intervalDays: 180, intervalHours: 500 },
  { title: "Change the hydraulic oil", kind: "oil-changed", intervalDays: 365, intervalHours: 1000 },
  { title: "Check the relief valve setting", kind: "relief-checked", intervalDays: 30, intervalHours: null },
];

export const SERVICE_KIND_LABELS: Record<ServiceKind, string> = {
  "hose-replaced": "Hose replaced",
  "filter-changed": "Filter element changed",
  "oil-changed": "Oil changed",
  "oil-topped-up": "Oil topped up",
  "oil-sample": "Oil sample",
  "relief-checked": "Relief valve checked",
  "leak-fixed": "Leak fixed",
  "weld-repaired": "Weld repaired",
  "die-changed": "Die changed",
  other: "Other",
};
