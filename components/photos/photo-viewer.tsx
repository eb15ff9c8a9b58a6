"use client";

import Image from "next/image";
import { useState, type FormEvent } from "react";
import { Button, buttonClass } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SelectField } from "@/components/ui/select-field";
import { MAX_CAPTION_LENGTH, PHOTO_KIND_LABELS, PHOTO_KIND_OPTIONS, type PhotoKind } from "@/lib/photos/kinds";
import { changePhoto, type PhotoItem } from "./photo-api";

type Props = {
  photo: PhotoItem | null;
  /** Uploader or manager: shows edit and delete (the server checks again). */
  canChange: boolean;
  onClose: () => void;
  onChanged: () => void;
};

const when = (iso: string): string => new Intl.DateTimeFormat(undefined, { dateStyle: "medium", timeStyle: "short" }).format(new Date(iso));

/** One photo, large, with its details; edit and delete for those allowed. */
export function PhotoViewer({ photo, canChange, onClose, onChanged }: Props) {
  return (
    <Dialog open={photo !== null} onClose={onClose} label={photo?.caption ?? "Photo"}>
      {photo ? <PhotoDetails key={photo.id} photo={photo} canChange={canChange} onClose={onClose} onChanged={onChanged} /> : null}
    </Dialog>
  );
}

function PhotoDetails({ photo, canChange, onClose, onChanged }: Props & { photo: PhotoItem }) {
  const [mode, setMode] = useState<"view" | "edit" | "confirm-delete">("view");
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string>();
  const title = photo.caption ?? `${PHOTO_KIND_LABELS[photo.kind]} photo`;

  async function run(change: Parameters<typeof changePhoto>[1], after: () => void): Promise<void> {
    setBusy(true);
    setError(undefined);
    try {
      await changePhoto(photo.id, change);
      onChanged();
      after();
    } catch (e) {
      setError(e instanceof Error ? e.message : "The change was not saved.");
    } finally {
      setBusy(false);
    }
  }

  function save(event: FormEvent<HTMLFormElement>): void {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    void run({ patch: { caption: String(form.get("caption") ?? ""), kind: String(form.get("kind")) as PhotoKind } }, () => setMode("view"));
  }

  return (
    <div className="flex flex-col">
      <header className="flex items-start justify-between gap-3 border-b border-steel-200 p-4">
        <div>
          <h2 className="text-base font-semibold">{title}</h2>
          <p className="text-xs text-steel-600">
            {PHOTO_KIND_LABELS[photo.kind]}
            {photo.componentLabel ? ` · Part: ${photo.componentLabel}` : ""} · {photo.uploaderName ?? "Former member"} · {when(photo.createdAt)}
          </p>
        </div>
        <Button variant="quiet" onClick={onClose} aria-label="Close" className="-mr-2 -mt-2 px-3 text-lg">
          ×
        </Button>
      </header>
      <div className="flex justify-center bg-steel-900">
        <Image
          src={photo.url}
          alt={title}
          width={photo.width}
          height={photo.height}
          sizes="(max-width: 896px) 100vw, 896px"
          loading="eager"
          // A short-lived, session-checked app link: the image optimizer (no cookies) cannot fetch it.
          unoptimized
          className="h-auto max-h-[65dvh] w-full object-contain"
        />
      </div>
      <div className="flex flex-col gap-3 p-4">
        <FormMessage message={error} />
        {mode === "edit" ? (
          <form onSubmit={save} className="grid gap-3 sm:grid-cols-[12rem_1fr_auto] sm:items-end">
            <SelectField name="kind" id="photo-edit-kind" label="Shows" options={PHOTO_KIND_OPTIONS} defaultValue={photo.kind} />
            <Field name="caption" id="photo-edit-caption" label="Caption" defaultValue={photo.caption ?? ""} maxLength={MAX_CAPTION_LENGTH} />
            <div className="flex gap-2">
              <Button type="submit" disabled={busy}>
                Save
              </Button>
              <Button type="button" variant="secondary" onClick={() => setMode("view")}>
                Cancel
              </Button>
            </div>
          </form>
        ) : mode === "confirm-delete" ? (
          <div className="flex flex-wrap items-center gap-2 rounded-md bg-fail-soft p-3 ring-1 ring-fail/30">
            <p className="mr-auto text-sm text-fail">Delete this photo for everyone in the shop? This cannot be undone.</p>
            <Button variant="danger" disabled={busy} onClick={() => void run({ remove: true }, onClose)}>
              Delete photo
            </Button>
            <Button variant="secondary" onClick={() => setMode("view")}>
              Keep it
            </Button>
          </div>
        ) : (
          <div className="flex flex-wrap gap-2">
            <a href={photo.url} target="_blank" rel="noopener noreferrer" className={buttonClass("secondary")}>
              Full size ({photo.width} × {photo.height})
            </a>
            {canChange ? (
              <>
                <Button variant="secondary" onClick={() => setMode("edit")}>
                  Edit
                </Button>
                <Button variant="quiet" className="text-fail" onClick={() => setMode("confirm-delete")}>
                  Delete…
                </Button>
              </>
            ) : null}
          </div>
        )}
      </div>
    </div>
  );
}
