"use client";

import { useRouter } from "next/navigation";
import { useCallback, useEffect, useState } from "react";
import type { TemplateItem } from "@/db/schema/inspections";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import { AREA_LABELS, LOCKOUT_STEPS } from "@/lib/inspections/labels";
import { RunItem } from "./run-item";
import { keepRunPageOffline } from "./run-worker";
import type { ConfirmedAnswers } from "./offline-queue";
import { useAnswerSync, type Answer } from "./use-answer-sync";

export type RunItemData = TemplateItem & { answerId: string; photos: number };

type Props = {
  inspectionId: string;
  pressId: string;
  items: RunItemData[];
  initial: ConfirmedAnswers;
  maySign: boolean;
  signRule: string;
  reauthAction: () => Promise<void>;
};

/** The checklist at the press, built for a phone: answers are kept in the browser until sent. */
export function RunChecklist({ inspectionId, pressId, items, initial, maySign, signRule, reauthAction }: Props) {
  const router = useRouter();
  const sync = useAnswerSync(inspectionId, initial);
  const [photos, setPhotos] = useState(() => Object.fromEntries(items.map((i) => [i.key, i.photos])));
  const [signing, setSigning] = useState(false);
  const [signError, setSignError] = useState<string | null>(null);
  const [needsSignIn, setNeedsSignIn] = useState(false);
  const answered = items.filter((i) => sync.answers[i.key]?.outcome).length;
  const { change } = sync;
  const answer = useCallback((key: string, a: Answer) => void change(key, a), [change]);

  useEffect(() => keepRunPageOffline(), []);

  async function sign(): Promise<void> {
    setSigning(true);
    setSignError(null);
    try {
      const res = await fetch(`/api/inspections/${inspectionId}/sign`, { method: "POST", headers: { "content-type": "application/json" }, body: "{}" });
      const body = (await res.json().catch(() => ({}))) as { error?: string; reauthenticate?: boolean };
      if (res.ok) {
        router.push(`/inspections/${inspectionId}`);
        return;
      }
      if (body.reauthenticate) setNeedsSignIn(true);
      setSignError(body.error ?? "Signing failed. Try again.");
    } catch {
      setSignError("No connection: signing needs one. Your answers are safe on this phone.");
    } finally {
      setSigning(false);
    }
  }

  const canSign = maySign && sync.online && sync.pendingCount === 0 && answered === items.length;
  return (
    <div className="flex flex-col gap-3">
      <div className="sticky top-0 z-10 -mx-4 flex flex-col gap-1 border-b border-steel-200 bg-steel-50/95 px-4 py-2 text-sm backdrop-blur" role="status" aria-live="polite">
        <div className="flex items-center justify-between gap-2">
          <span className="font-semibold">
            {answered} of {items.length} answered
          </span>
          <span className={sync.online ? "text-ok" : "font-semibold text-warn"} data-testid="connection">
            {sync.online ? "Online" : "No connection"}
          </span>
        </div>
        <progress value={answered} max={items.length} className="h-1.5 w-full accent-oil-500" aria-label="Answered" />
        <p data-testid="sync-state" className={sync.pendingCount > 0 ? "font-medium text-warn" : "text-steel-600"}>
          {sync.pendingCount > 0
            ? `${sync.unsent.size === 1 ? "1 answer" : `${sync.unsent.size} answers`} not yet sent — kept on this phone and sent when the connection returns.`
            : "Every answer is saved on the server."}
        </p>
      </div>
      {sync.problem ? <FormMessage message={sync.problem} /> : null}

      <ol className="flex flex-col gap-3">
        {items.map((item, index) => {
          const before = items[index - 1];
          return (
            <ItemWithHeadings key={item.key} area={before?.area === item.area ? null : AREA_LABELS[item.area]} lockout={item.lockout && !before?.lockout}>
              <RunItem
                // Mounted again once the browser's queue is read, so each item starts from its latest answer.
                key={sync.ready ? "ready" : "loading"}
                item={item}
                answer={sync.answers[item.key] ?? { outcome: null, note: null }}
                unsent={sync.unsent.has(item.key)}
                pressId={pressId}
                online={sync.online}
                photos={photos[item.key] ?? 0}
                disabled={false}
                onAnswer={(a) => answer(item.key, a)}
                onPhoto={() => setPhotos((p) => ({ ...p, [item.key]: (p[item.key] ?? 0) + 1 }))}
              />
            </ItemWithHeadings>
          );
        })}
      </ol>

      <section aria-label="Sign off" className="rounded-lg bg-white p-4 ring-1 ring-steel-200">
        <h2 className="font-semibold">Sign off</h2>
        <p className="mt-1 text-sm text-steel-600">
          Your signature records your name, the time and a link in this press&apos;s chain of records. After signing nothing can be changed. {signRule}
        </p>
        {!sync.online ? <p className="mt-2 text-sm font-medium text-warn">Signing needs a connection: the signature is the record of evidence. Your answers are kept until then.</p> : null}
        {signError ? (
          <div className="mt-2">
            <FormMessage message={signError} />
          </div>
        ) : null}
        {needsSignIn ? (
          <form action={reauthAction} className="mt-2">
            <Button type="submit" variant="secondary">
              Sign in again, then sign
            </Button>
          </form>
        ) : null}
        <Button type="button" className="mt-3 w-full" disabled={!canSign || signing} onClick={() => void sign()}>
          {signing ? "Signing…" : "Sign this inspection"}
        </Button>
        {maySign ? null : <p className="mt-2 text-sm text-steel-600">Your role cannot sign this checklist; someone who may will sign it.</p>}
      </section>
    </div>
  );
}

function ItemWithHeadings({ area, lockout, children }: { area: string | null; lockout: boolean; children: React.ReactNode }) {
  return (
    <>
      {area ? <li className="mt-2 text-xs font-semibold uppercase tracking-wide text-steel-500">{area}</li> : null}
      {lockout ? (
        <li role="note" className="rounded-lg bg-warn-soft p-3 text-sm text-ink ring-1 ring-warn/40" data-testid="lockout-reminder">
          <strong>Lock out before the next items.</strong> {LOCKOUT_STEPS} Never feel for a leak with a hand.
        </li>
      ) : null}
      {children}
    </>
  );
}
