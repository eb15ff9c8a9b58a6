import type { SizingInput } from "@/lib/hydraulics/types";

/**
 * Links into the sizing pages, kept apart from the schemas that read them back so the
 * calculator's bundle does not carry classic zod just to build a URL.
 */

/** The printable gauge card for these SI figures (read by lib/validation/gauge-card.ts). */
export function gaugeCardHref(q: { boreMm: number; count: number; reliefBar: number; units: "metric" | "imperial"; name: string }): string {
  const params = new URLSearchParams({
    bore: String(q.boreMm),
    count: String(q.count),
    relief: String(q.reliefBar),
    units: q.units,
  });
  if (q.name.trim()) params.set("name", q.name.trim());
  return `/sizing/gauge-card?${params.toString()}`;
}

/** The sizing page reopened on these inputs (SI JSON in the query; read back through the schema). */
export function sizingHref(input: SizingInput | null, name: string): string {
  if (!input) return "/sizing";
  const params = new URLSearchParams({ input: JSON.stringify(input) });
  if (name.trim()) params.set("name", name.trim());
  return `/sizing?${params.toString()}`;
}
