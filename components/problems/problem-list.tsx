import Image from "next/image";
import { closeProblemAction } from "@/app/(app)/presses/[pressId]/problem-actions";
import type { ProblemView } from "@/lib/data/problems";
import { SEVERITY_LABELS } from "@/lib/problem-labels";
import { localDate, localTime } from "@/lib/time-zone";
import { CloseProblemForm } from "./close-problem-form";

function ProblemPhotos({ problem }: { problem: ProblemView }) {
  if (problem.photos.length === 0) return null;
  return (
    <ul className="mt-2 flex flex-wrap gap-2">
      {problem.photos.map((photo) => (
        <li key={photo.id}>
          <Image src={photo.thumbUrl} alt={photo.caption ?? "Photo of the problem"} width={photo.thumbWidth} height={photo.thumbHeight} sizes="96px" className="h-20 w-24 rounded object-cover ring-1 ring-steel-200" />
        </li>
      ))}
    </ul>
  );
}

const when = (d: Date, zone: string): string => `${localDate(d, zone)} ${localTime(d, zone)}`;

/** Open reports (with a close form for managers and inspectors) and the last few closed ones. */
export function ProblemList({ pressId, problems, canClose, timeZone }: { pressId: string; problems: { open: ProblemView[]; closed: ProblemView[] }; canClose: boolean; timeZone: string }) {
  return (
    <div className="flex flex-col gap-3" data-testid="problem-list">
      {problems.open.length === 0 ? <p className="text-sm text-steel-600">No open problem reports.</p> : null}
      <ul className="flex flex-col gap-3">
        {problems.open.map((p) => (
          <li key={p.id} className="rounded-md p-3 ring-1 ring-steel-200">
            <p className="text-sm font-medium">
              {p.stopUse ? <span className="mr-2 rounded bg-fail-soft px-1.5 py-0.5 text-xs font-semibold text-fail">Stop use</span> : null}
              {SEVERITY_LABELS[p.severity]} · {when(p.reportedAt, timeZone)}
              {p.reporterName ? ` · ${p.reporterName}` : ""}
            </p>
            <p className="mt-1 text-sm whitespace-pre-line">{p.description}</p>
            <ProblemPhotos problem={p} />
            {canClose ? <CloseProblemForm problemId={p.id} action={closeProblemAction.bind(null, pressId, p.id)} /> : null}
          </li>
        ))}
      </ul>
      {problems.closed.length > 0 ? (
        <details className="text-sm">
          <summary className="cursor-pointer text-steel-700">Recently closed ({problems.closed.length})</summary>
          <ul className="mt-2 flex flex-col gap-2">
            {problems.closed.map((p) => (
              <li key={p.id} className="text-steel-600">
                {p.description} — closed {p.closedAt ? when(p.closedAt, timeZone) : ""}: {p.closeReason}
                {p.serviceEntryId ? ` (service-log entry ${p.serviceEntryId})` : ""}
              </li>
            ))}
          </ul>
        </details>
      ) : null}
    </div>
  );
}
