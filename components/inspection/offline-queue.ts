"use client";

import { openDB, type DBSchema, type IDBPDatabase } from "idb";
import type { Outcome } from "@/db/schema/inspections";

/** One answer change waiting on the phone until the server has it. `seq` keeps the order given. */
export type PendingChange = { seq?: number; inspectionId: string; opKey: string; itemKey: string; outcome: Outcome | null; note: string | null; queuedAt: number };

/** The answers the server last confirmed, with the server's time of each (ms), per item. */
export type ConfirmedAnswers = Record<string, { outcome: Outcome | null; note: string | null; at: number | null }>;

interface RunQueue extends DBSchema {
  changes: { key: number; value: PendingChange; indexes: { byInspection: string } };
  confirmed: { key: string; value: { inspectionId: string; answers: ConfirmedAnswers } };
}

let opened: Promise<IDBPDatabase<RunQueue>> | null = null;

/** The browser's queue of unsent answers (IndexedDB, so it survives a reload and a dead battery). */
function queue(): Promise<IDBPDatabase<RunQueue>> {
  opened ??= openDB<RunQueue>("presswright-inspection-runs", 1, {
    upgrade(db) {
      const store = db.createObjectStore("changes", { keyPath: "seq", autoIncrement: true });
      store.createIndex("byInspection", "inspectionId");
      db.createObjectStore("confirmed", { keyPath: "inspectionId" });
    },
  });
  return opened;
}

export async function enqueueChange(change: Omit<PendingChange, "seq">): Promise<void> {
  await (await queue()).add("changes", change as PendingChange);
}

/** This inspection's unsent changes, oldest first (auto-increment keys keep the order given). */
export async function pendingChanges(inspectionId: string): Promise<PendingChange[]> {
  const all = await (await queue()).getAllFromIndex("changes", "byInspection", inspectionId);
  return all.sort((a, b) => (a.seq ?? 0) - (b.seq ?? 0));
}

/** Forgets changes the server has confirmed (or refused for good). */
export async function dropChanges(seqs: readonly number[]): Promise<void> {
  const tx = (await queue()).transaction("changes", "readwrite");
  await Promise.all([...seqs.map((seq) => tx.store.delete(seq)), tx.done]);
}

/** Keeps the server's last answer state, so a page reloaded from the offline copy is not behind it. */
export async function saveConfirmed(inspectionId: string, answers: ConfirmedAnswers): Promise<void> {
  await (await queue()).put("confirmed", { inspectionId, answers });
}

export async function loadConfirmed(inspectionId: string): Promise<ConfirmedAnswers | null> {
  return (await (await queue()).get("confirmed", inspectionId))?.answers ?? null;
}

/** Per item, the answer the server recorded last (its own clock decides, never the phone's). */
export function newestAnswers(a: ConfirmedAnswers, b: ConfirmedAnswers | null): ConfirmedAnswers {
  const out = { ...a };
  for (const [key, answer] of Object.entries(b ?? {})) if ((answer.at ?? -1) > (out[key]?.at ?? -1)) out[key] = answer;
  return out;
}
