import Link from "next/link";
import { formatInTimeZone } from "@/lib/service/format";

/**
 * One row of a due list. Service fills it today; inspections add their own kind with the same
 * shape (a title, a state, a date and/or an hour reading, and where to go).
 */
export type DueRow = {
  key: string;
  kind: "service" | "inspection";
  title: string;
  pressName?: string;
  href: string;
  state: "due-soon" | "overdue";
  dueDate: Date | null;
  dueHours: number | null;
};

const STATE_STYLE = {
  overdue: "bg-fail-soft text-fail ring-fail/30",
  "due-soon": "bg-warn-soft text-warn ring-warn/30",
} as const;

export function DueStateBadge({ state }: { state: "ok" | "due-soon" | "overdue" }) {
  if (state === "ok") return <span className="rounded-full bg-ok-soft px-2 py-0.5 text-xs font-semibold text-ok ring-1 ring-ok/30">Later</span>;
  return <span className={`rounded-full px-2 py-0.5 text-xs font-semibold ring-1 ${STATE_STYLE[state]}`}>{state === "overdue" ? "Overdue" : "Due soon"}</span>;
}

/** What falls due, most urgent first; `empty` when nothing does. */
export function DueList({ rows, timeZone, empty, testId }: { rows: DueRow[]; timeZone: string; empty: string; testId?: string }) {
  if (rows.length === 0) return <p className="text-sm text-steel-600" data-testid={testId}>{empty}</p>;
  return (
    <ul className="divide-y divide-steel-100" data-testid={testId}>
      {rows.map((row) => (
        <li key={row.key} className="flex items-start justify-between gap-3 py-2">
          <div className="min-w-0">
            <Link href={row.href} className="font-medium text-ink underline decoration-steel-300 underline-offset-2">
              {row.title}
            </Link>
            <p className="text-xs text-steel-600">
              {[row.pressName, row.kind === "service" ? "Service" : "Inspection", dueText(row, timeZone)].filter(Boolean).join(" · ")}
            </p>
          </div>
          <DueStateBadge state={row.state} />
        </li>
      ))}
    </ul>
  );
}

export function dueText(due: { dueDate: Date | null; dueHours: number | null }, timeZone: string): string {
  const parts = [due.dueDate ? formatInTimeZone(due.dueDate, timeZone) : null, due.dueHours !== null ? `at ${due.dueHours} h` : null].filter(Boolean);
  return parts.length ? `due ${parts.join(" or ")}` : "";
}
