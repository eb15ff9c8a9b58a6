/**
 * The one function that derives a press's status — every page, API and e-mail that shows a status
 * calls `pressStatus`. Pure: no I/O, no clock (the loader in lib/data/press-status.ts gathers the
 * inputs for many presses at once).
 *
 * Precedence, most serious first: not in service › tagged out › inspection overdue › service due ›
 * ready. `reasons` explain the status in plain words; `notes` list lesser concerns that do not
 * change it (something due soon, or a lower-ranked condition hidden by a higher one).
 */
import type { LIFECYCLES } from "@/db/schema/presses";
import type { TagOutSource } from "@/db/schema/tag-outs";

export type Lifecycle = (typeof LIFECYCLES)[number];
export type DueState = "due-soon" | "overdue";

export type StatusInput = {
  lifecycle: Lifecycle;
  /** Open (not cleared) tag-outs, whatever their source. */
  tagOuts: readonly { source: TagOutSource; reason: string }[];
  inspectionsDue: readonly { name: string; state: DueState; dueAt: Date | null }[];
  serviceDue: readonly { title: string; state: DueState; dueDate: Date | null; dueHours: number | null }[];
};

export const STATUS_CODES = ["not-in-service", "tagged-out", "inspection-overdue", "service-due", "ready"] as const;
export type StatusCode = (typeof STATUS_CODES)[number];

export const STATUS_LABELS: Record<StatusCode, string> = {
  "not-in-service": "Not in service",
  "tagged-out": "Tagged out",
  "inspection-overdue": "Inspection overdue",
  "service-due": "Service due",
  ready: "Ready",
};

export type PressStatus = {
  code: StatusCode;
  label: string;
  reasons: string[];
  notes: string[];
  /** May the press be booked and used? Only "not in service" and "tagged out" forbid it. */
  usable: boolean;
};

const NOT_IN_SERVICE: Partial<Record<Lifecycle, string>> = {
  planned: "This press is still being planned.",
  building: "This press is being built and has not been put into service.",
  retired: "This press is retired.",
};

const TAG_OUT_WORDS: Record<TagOutSource, string> = {
  problem: "Stop-use problem reported",
  inspection: "Failed critical inspection item",
  manual: "Tag-out",
};

const tagOutReason = (t: StatusInput["tagOuts"][number]): string => `${TAG_OUT_WORDS[t.source]}: ${t.reason}`;

const day = (d: Date | null): string => (d ? ` (${d.toISOString().slice(0, 10)})` : "");

function inspectionReason(i: StatusInput["inspectionsDue"][number]): string {
  return i.state === "overdue" ? `Inspection overdue: ${i.name}${day(i.dueAt)}` : `Inspection due soon: ${i.name}${day(i.dueAt)}`;
}

function serviceReason(s: StatusInput["serviceDue"][number]): string {
  const when = [s.dueDate ? s.dueDate.toISOString().slice(0, 10) : null, s.dueHours !== null ? `at ${s.dueHours} h` : null].filter(Boolean).join(", ");
  return `${s.state === "overdue" ? "Service overdue" : "Service due soon"}: ${s.title}${when ? ` (${when})` : ""}`;
}

export function pressStatus(input: StatusInput): PressStatus {
  const tagged = input.tagOuts.map(tagOutReason);
  const inspOverdue = input.inspectionsDue.filter((i) => i.state === "overdue").map(inspectionReason);
  const inspSoon = input.inspectionsDue.filter((i) => i.state === "due-soon").map(inspectionReason);
  const serviceOverdue = input.serviceDue.filter((s) => s.state === "overdue").map(serviceReason);
  const serviceSoon = input.serviceDue.filter((s) => s.state === "due-soon").map(serviceReason);

  // Each rank in order; the first with reasons wins, everything below it becomes a note.
  const notInService = NOT_IN_SERVICE[input.lifecycle];
  const ranks: [StatusCode, string[]][] = [
    ["not-in-service", notInService ? [notInService] : []],
    ["tagged-out", tagged],
    ["inspection-overdue", inspOverdue],
    ["service-due", serviceOverdue],
  ];
  const winner = ranks.findIndex(([, reasons]) => reasons.length > 0);
  const code: StatusCode = winner === -1 ? "ready" : ranks[winner]![0];
  const reasons = winner === -1 ? [] : ranks[winner]![1];
  const lower = winner === -1 ? [] : ranks.slice(winner + 1).flatMap(([, r]) => r);
  return {
    code,
    label: STATUS_LABELS[code],
    reasons,
    notes: [...lower, ...inspSoon, ...serviceSoon],
    usable: code !== "not-in-service" && code !== "tagged-out",
  };
}

/** The reason a press cannot be booked or used right now, or null when it can. */
export function unusableReason(status: PressStatus): string | null {
  if (status.usable) return null;
  return `${status.label} — ${status.reasons.join("; ")}`;
}
