import type { PressStatus, StatusCode } from "@/lib/status";

// Text and an icon shape for every status, so it never relies on colour alone.
const LOOK: Record<StatusCode, { className: string; icon: string }> = {
  ready: { className: "bg-ok-soft text-ok ring-ok/30", icon: "M4 10.5l4 4 8-9" },
  "service-due": { className: "bg-warn-soft text-warn ring-warn/30", icon: "M10 5v6M10 14.5v.5" },
  "inspection-overdue": { className: "bg-warn-soft text-warn ring-warn/30", icon: "M10 4v6l3.5 2.5M10 1.8a8.2 8.2 0 1 0 0 16.4 8.2 8.2 0 0 0 0-16.4" },
  "tagged-out": { className: "bg-fail-soft text-fail ring-fail/30", icon: "M5 5l10 10M15 5L5 15" },
  "not-in-service": { className: "bg-steel-100 text-steel-700 ring-steel-300", icon: "M4 10h12" },
};

/** The press status as a badge: icon + words. `large` for the status page at the press. */
export function StatusBadge({ status, large = false }: { status: Pick<PressStatus, "code" | "label">; large?: boolean }) {
  const look = LOOK[status.code];
  return (
    <span
      data-status={status.code}
      className={`inline-flex items-center gap-1.5 rounded-full font-semibold ring-1 ${look.className} ${large ? "px-4 py-2 text-xl" : "px-2 py-0.5 text-xs"}`}
    >
      <svg aria-hidden="true" viewBox="0 0 20 20" className={large ? "h-6 w-6" : "h-3.5 w-3.5"} fill="none" stroke="currentColor" strokeWidth={2.4} strokeLinecap="round" strokeLinejoin="round">
        <path d={look.icon} />
      </svg>
      {status.label}
    </span>
  );
}

/** Reasons and notes under a badge. */
export function StatusReasons({ status }: { status: Pick<PressStatus, "reasons" | "notes"> }) {
  if (status.reasons.length === 0 && status.notes.length === 0) return null;
  return (
    <ul className="mt-2 space-y-1 text-sm">
      {status.reasons.map((r) => (
        <li key={r} className="font-medium text-ink">
          {r}
        </li>
      ))}
      {status.notes.map((n) => (
        <li key={n} className="text-steel-600">
          {n}
        </li>
      ))}
    </ul>
  );
}
