"use client";

import { useCallback, useEffect, useRef, useState, useSyncExternalStore } from "react";
import type { Outcome } from "@/db/schema/inspections";
import { dropChanges, enqueueChange, loadConfirmed, newestAnswers, pendingChanges, saveConfirmed, type ConfirmedAnswers, type PendingChange } from "./offline-queue";

export type Answer = { outcome: Outcome | null; note: string | null };
type ServerItem = Answer & { itemKey: string; answeredAt: string | null };

const RETRY_MS = 15_000;

function subscribeOnline(notify: () => void): () => void {
  window.addEventListener("online", notify);
  window.addEventListener("offline", notify);
  return () => {
    window.removeEventListener("online", notify);
    window.removeEventListener("offline", notify);
  };
}

/**
 * Answers of one run: what the server has confirmed, plus changes kept in the browser until they
 * are sent. Changes go out in the order given, each with its own idempotency key, so a send
 * repeated after a dropped connection lands once. Sending needs no user action: it happens after
 * each change, when the browser comes back online, and every few seconds while anything waits.
 */
export function useAnswerSync(inspectionId: string, initial: ConfirmedAnswers) {
  const [confirmed, setConfirmed] = useState(initial);
  const [pending, setPending] = useState<PendingChange[]>([]);
  const online = useSyncExternalStore(subscribeOnline, () => navigator.onLine, () => true);
  const [problem, setProblem] = useState<string | null>(null);
  const [ready, setReady] = useState(false);
  const sending = useRef(false);
  const again = useRef(false);

  const reload = useCallback(async () => {
    setPending(await pendingChanges(inspectionId));
    setReady(true);
  }, [inspectionId]);

  /** Sends what waits, in order; true when the server took it (or nothing waited). */
  const sendOnce = useCallback(async (): Promise<boolean> => {
    const changes = await pendingChanges(inspectionId);
    if (changes.length === 0) return true;
    let res: Response;
    try {
      res = await fetch(`/api/inspections/${inspectionId}`, {
        method: "PATCH",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ answers: changes.map(({ opKey, itemKey, outcome, note }) => ({ opKey, itemKey, outcome, note })) }),
      });
    } catch {
      return false; // No connection: the changes stay queued for the next try.
    }
    const seqs = changes.flatMap((c) => (c.seq === undefined ? [] : [c.seq]));
    if (res.ok) {
      const body = (await res.json()) as { items: ServerItem[] };
      await dropChanges(seqs);
      const answers = Object.fromEntries(body.items.map((i) => [i.itemKey, { outcome: i.outcome, note: i.note, at: i.answeredAt ? Date.parse(i.answeredAt) : null }]));
      await saveConfirmed(inspectionId, answers);
      setConfirmed(answers);
      setProblem(null);
      return true;
    }
    if (res.status === 401) {
      setProblem("Your sign-in has ended. Your answers are kept on this phone: sign in again to send them.");
    } else if (res.status >= 500) {
      setProblem("The server could not take the answers just now; they are kept here and sent again shortly.");
    } else {
      // Refused for good (signed meanwhile, no longer allowed): say so and stop retrying them.
      const body = (await res.json().catch(() => ({}))) as { error?: string };
      await dropChanges(seqs);
      setProblem(`These answers were refused: ${body.error ?? res.statusText}`);
    }
    return false;
  }, [inspectionId]);

  /** One sender at a time; a change made while sending is sent right after. */
  const send = useCallback(async () => {
    if (!navigator.onLine) return;
    if (sending.current) {
      again.current = true;
      return;
    }
    sending.current = true;
    try {
      do again.current = false;
      while ((await sendOnce()) && again.current);
    } finally {
      sending.current = false;
      await reload();
    }
  }, [reload, sendOnce]);

  // Read the browser's queue once, then send whatever waits now and whenever the connection returns.
  useEffect(() => {
    let live = true;
    void Promise.all([pendingChanges(inspectionId), loadConfirmed(inspectionId)]).then(([list, stored]) => {
      if (!live) return;
      setPending(list);
      setConfirmed((current) => newestAnswers(current, stored));
      setReady(true);
      void send();
    });
    const retry = () => void send();
    window.addEventListener("online", retry);
    return () => {
      live = false;
      window.removeEventListener("online", retry);
    };
  }, [inspectionId, send]);

  useEffect(() => {
    if (pending.length === 0) return;
    const timer = setInterval(() => void send(), RETRY_MS);
    return () => clearInterval(timer);
  }, [pending.length, send]);

  const change = useCallback(
    async (itemKey: string, answer: Answer) => {
      await enqueueChange({ inspectionId, opKey: crypto.randomUUID(), itemKey, ...answer, queuedAt: Date.now() });
      await reload();
      void send();
    },
    [inspectionId, reload, send],
  );

  /** The latest answer per item: a queued change wins over what the server confirmed. */
  const answers: Record<string, Answer> = { ...confirmed };
  for (const c of pending) answers[c.itemKey] = { outcome: c.outcome, note: c.note };
  const unsent = new Set(pending.map((c) => c.itemKey));
  return { answers, unsent, pendingCount: pending.length, online, problem, ready, change, send };
}
