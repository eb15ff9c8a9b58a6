/** One chronological history of a press, built from its parts and hour-meter log. Pure. */
export type TimelineEvent = {
  /** ISO date (YYYY-MM-DD) the event happened. */
  on: string;
  kind: "installed" | "removed" | "replaced" | "hours" | "created";
  title: string;
  detail?: string;
};

/** `replacedByLabel` names the successor when it is not among `parts` (a window of the history). */
type Part = { id: string; label: string; installedOn: string | null; removedOn: string | null; removalReason: string | null; replacedById: string | null; replacedByLabel?: string | null };
type Reading = { hours: number; readAt: Date; note: string | null; kind?: "reading" | "correction"; voided?: boolean; recordedByName?: string | null };

/** Newest first; with `limit`, only that many (callers pass at least the newest `limit` of each source). */
export function pressTimeline(created: Date, parts: Part[], readings: Reading[], limit = Infinity): TimelineEvent[] {
  const byId = new Map(parts.map((p) => [p.id, p]));
  const events: TimelineEvent[] = [{ on: created.toISOString().slice(0, 10), kind: "created", title: "Press record created" }];
  for (const part of parts) {
    if (part.installedOn) events.push({ on: part.installedOn, kind: "installed", title: `${part.label} installed` });
    if (part.removedOn) {
      const successor = part.replacedById ? (byId.get(part.replacedById)?.label ?? part.replacedByLabel) : undefined;
      events.push({
        on: part.removedOn,
        kind: successor ? "replaced" : "removed",
        title: successor ? `${part.label} replaced by ${successor}` : `${part.label} removed`,
        detail: part.removalReason ?? undefined,
      });
    }
  }
  for (const r of readings) {
    const by = r.recordedByName ? ` by ${r.recordedByName}` : "";
    const title =
      r.kind === "correction"
        ? `Hour meter corrected to ${r.hours} h${by}`
        : `Hour meter read ${r.hours} h${r.voided ? " (replaced by a correction)" : ""}`;
    events.push({ on: r.readAt.toISOString().slice(0, 10), kind: "hours", title, detail: r.note ?? undefined });
  }
  // Newest first; on the same day a removal reads before the installation of its successor.
  const order = { created: 0, installed: 1, hours: 2, removed: 3, replaced: 3 } as const;
  return events.sort((a, b) => (a.on === b.on ? order[b.kind] - order[a.kind] : b.on.localeCompare(a.on))).slice(0, limit);
}
