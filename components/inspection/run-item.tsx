"use client";

import { useEffect, useId, useState } from "react";
import type { Outcome, TemplateItem } from "@/db/schema/inspections";
import { PhotoUploader } from "@/components/photos/lazy-photo-uploader";
import { MAX_NOTE_LENGTH } from "@/lib/validation/inspection";
import { OUTCOME_LABELS } from "@/lib/inspections/labels";
import type { Answer } from "./use-answer-sync";

type Props = {
  item: TemplateItem & { answerId: string };
  answer: Answer;
  unsent: boolean;
  pressId: string;
  online: boolean;
  photos: number;
  disabled: boolean;
  onAnswer: (answer: Answer) => void;
  onPhoto: () => void;
};

const TONES: Record<Outcome, string> = {
  pass: "aria-pressed:bg-ok aria-pressed:text-white aria-pressed:ring-ok",
  fail: "aria-pressed:bg-fail aria-pressed:text-white aria-pressed:ring-fail",
  na: "aria-pressed:bg-steel-600 aria-pressed:text-white aria-pressed:ring-steel-600",
};

// A note is saved once typing pauses, so each pause is one queued change, not one per key.
const NOTE_PAUSE_MS = 700;

/** One checklist item: pass / fail / n.a., a note (required on fail), a photo of a failure. */
export function RunItem({ item, answer, unsent, pressId, online, photos, disabled, onAnswer, onPhoto }: Props) {
  const id = useId();
  const [failing, setFailing] = useState(answer.outcome === "fail");
  const [note, setNote] = useState(answer.note ?? "");
  const outcome = failing ? "fail" : answer.outcome;
  const needsNote = outcome === "fail" && !note.trim();

  useEffect(() => {
    if (!failing || !note.trim() || (answer.outcome === "fail" && note.trim() === (answer.note ?? ""))) return;
    const timer = setTimeout(() => onAnswer({ outcome: "fail", note: note.trim() }), NOTE_PAUSE_MS);
    return () => clearTimeout(timer);
  }, [failing, note, answer, onAnswer]);

  function choose(next: Outcome): void {
    if (next === "fail") {
      setFailing(true);
      if (note.trim()) onAnswer({ outcome: "fail", note: note.trim() });
      return;
    }
    setFailing(false);
    onAnswer({ outcome: next, note: note.trim() || null });
  }

  return (
    <li className={`rounded-lg bg-white p-3 ring-1 ${outcome === "fail" ? "ring-fail/50" : "ring-steel-200"}`} data-testid={`item-${item.key}`}>
      <div className="flex items-start justify-between gap-2">
        <p id={`${id}-text`} className="font-medium text-ink">
          {item.text}
        </p>
        <div className="flex shrink-0 flex-col items-end gap-1 text-xs">
          {item.critical ? <span className="rounded bg-fail-soft px-1.5 py-0.5 font-semibold text-fail">Critical</span> : null}
          {unsent ? (
            <span className="rounded bg-warn-soft px-1.5 py-0.5 font-semibold text-warn" data-testid="unsent">
              Not yet sent
            </span>
          ) : null}
        </div>
      </div>
      {item.guidance ? <p className="mt-1 text-sm text-steel-600">{item.guidance}</p> : null}
      <div role="group" aria-labelledby={`${id}-text`} className="mt-3 grid grid-cols-3 gap-2">
        {(["pass", "fail", "na"] as const).map((o) => (
          <button
            key={o}
            type="button"
            disabled={disabled}
            aria-pressed={outcome === o}
            onClick={() => choose(o)}
            className={`min-h-12 rounded-md bg-steel-50 text-sm font-semibold text-ink ring-1 ring-steel-300 disabled:opacity-60 ${TONES[o]}`}
          >
            {OUTCOME_LABELS[o]}
          </button>
        ))}
      </div>
      {outcome === "fail" || note ? (
        <div className="mt-3 flex flex-col gap-1">
          <label htmlFor={`${id}-note`} className="text-sm font-medium text-steel-800">
            {outcome === "fail" ? "What is wrong? (required)" : "Note (optional)"}
          </label>
          <textarea
            id={`${id}-note`}
            value={note}
            disabled={disabled}
            maxLength={MAX_NOTE_LENGTH}
            rows={2}
            aria-invalid={needsNote || undefined}
            aria-describedby={needsNote ? `${id}-need` : undefined}
            onChange={(e) => setNote(e.target.value)}
            onBlur={() => {
              if (outcome !== "fail" && outcome && note.trim() !== (answer.note ?? "")) onAnswer({ outcome, note: note.trim() || null });
            }}
            className="rounded-md border border-steel-300 px-3 py-2 text-base aria-invalid:border-fail"
          />
          {needsNote ? (
            <p id={`${id}-need`} className="text-sm text-fail">
              A failed item needs a note before it is saved.
            </p>
          ) : null}
        </div>
      ) : null}
      {outcome === "fail" && answer.outcome === "fail" && !disabled ? (
        <div className="mt-3">
          <p className="mb-2 text-sm text-steel-700">
            {photos > 0 ? `${photos} photo${photos === 1 ? "" : "s"} attached.` : item.photoOnFail ? "This item needs a photo of the failure before signing." : "A photo helps whoever fixes it."}
          </p>
          {online ? <PhotoUploader target={{ pressId, inspectionItemId: item.answerId }} onUploaded={onPhoto} /> : <p className="text-sm text-steel-600">Photos can be added when the connection returns.</p>}
        </div>
      ) : null}
    </li>
  );
}
