import Link from "next/link";
import { clearTagOutAction, tagOutAction } from "@/app/(app)/presses/[pressId]/tag-out-actions";
import { formatWhen } from "@/components/inspection/inspection-record";
import type { ClearedTagOutView, TagOutView } from "@/lib/data/press-tag-outs";
import { ReasonForm } from "./reason-form";

const SOURCE_LABELS = { inspection: "Failed inspection", problem: "Problem report", manual: "Tagged out by hand" } as const;

type Props = { pressId: string; open: TagOutView[]; cleared: ClearedTagOutView[]; canManage: boolean; timeZone: string };

/**
 * Open tag-outs with their reasons; managers and inspectors clear one with a recorded reason or
 * tag the press out by hand. A passing re-inspection clears inspection tag-outs by itself.
 */
export function TagOutPanel({ pressId, open, cleared, canManage, timeZone }: Props) {
  return (
    <div className="flex flex-col gap-3" data-testid="tag-out-panel">
      {open.length === 0 ? (
        <p className="rounded-md bg-ok-soft px-3 py-2 text-sm font-medium text-ok ring-1 ring-ok/30">Not tagged out.</p>
      ) : (
        <div role="alert" className="rounded-md bg-fail-soft px-3 py-2 text-sm text-fail ring-1 ring-fail/30">
          <p className="font-semibold">Tagged out — do not use this press.</p>
        </div>
      )}
      <ul className="flex flex-col gap-3">
        {open.map((t) => (
          <li key={t.id} className="rounded-md p-3 ring-1 ring-fail/30">
            <p className="text-sm font-semibold text-ink">{SOURCE_LABELS[t.source]}</p>
            <p className="text-sm">{t.reason}</p>
            <p className="text-xs text-steel-600">
              {formatWhen(t.taggedAt, timeZone)}
              {t.taggedByName ? ` · ${t.taggedByName}` : ""}
              {t.source === "inspection" && t.sourceId ? (
                <>
                  {" · "}
                  <Link href={`/inspections/${t.sourceId}`} className="underline">
                    the inspection
                  </Link>
                </>
              ) : null}
            </p>
            {canManage ? (
              <div className="mt-2">
                <ReasonForm action={clearTagOutAction.bind(null, t.id)} label="Why it is safe again" submit="Clear tag-out" placeholder="e.g. Nuts re-torqued and checked" />
              </div>
            ) : null}
          </li>
        ))}
      </ul>
      {canManage ? <ReasonForm action={tagOutAction.bind(null, pressId)} label="Tag out by hand — reason" submit="Tag out" variant="danger" placeholder="e.g. Pump being rebuilt" /> : null}
      {cleared.length > 0 ? (
        <details className="text-sm">
          <summary className="cursor-pointer text-steel-600">Recently cleared</summary>
          <ul className="mt-2 flex flex-col gap-1">
            {cleared.map((t) => (
              <li key={t.id} className="text-steel-700">
                {t.reason} — cleared {formatWhen(t.clearedAt, timeZone)}
                {t.clearedByName ? ` by ${t.clearedByName}` : ""}: {t.clearReason}
              </li>
            ))}
          </ul>
        </details>
      ) : null}
    </div>
  );
}
