"use client";

import { useId, useRef, useState, type ChangeEvent } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SelectField } from "@/components/ui/select-field";
import { MAX_CAPTION_LENGTH, PHOTO_KIND_OPTIONS, type PhotoKind } from "@/lib/photos/kinds";
import { MAX_PHOTOS_PER_UPLOAD } from "@/lib/photos/limits";
import { useUploadThing } from "@/lib/uploads/client";
import { checkPhotoFiles, explainUploadError, formatBytes } from "./upload-checks";

export type PartOption = { id: string; label: string };
/** What the photos attach to; the upload route checks the user may attach to it. */
export type PhotoTarget = { pressId: string; componentId?: string; serviceEntryId?: string; problemReportId?: string; inspectionItemId?: string };

type Props = {
  target: PhotoTarget;
  /** Offer a choice of part when the target is a press. */
  parts?: PartOption[];
  onUploaded?: (photoIds: string[]) => void;
};

/**
 * Picks photos (or takes one with a phone's camera), checks them before sending, uploads them
 * straight to storage and reports what the server made of each. Reusable for any record that
 * takes photos: pass the target.
 */
export function PhotoUploader({ target, parts = [], onUploaded }: Props) {
  const id = useId();
  const pickRef = useRef<HTMLInputElement>(null);
  const cameraRef = useRef<HTMLInputElement>(null);
  const [files, setFiles] = useState<File[]>([]);
  const [kind, setKind] = useState<PhotoKind>("other");
  const [componentId, setComponentId] = useState(target.componentId ?? "");
  const [caption, setCaption] = useState("");
  const [problems, setProblems] = useState<string[]>([]);
  const [done, setDone] = useState<string>();
  const [progress, setProgress] = useState(0);

  const { startUpload, isUploading } = useUploadThing("pressPhoto", {
    onUploadProgress: setProgress,
    onUploadError: (error) => setProblems([explainUploadError(error.message)]),
  });

  function choose(event: ChangeEvent<HTMLInputElement>): void {
    const picked = [...files, ...Array.from(event.target.files ?? [])];
    event.target.value = "";
    const { accepted, problems: found } = checkPhotoFiles(picked);
    setFiles(accepted);
    setProblems(found);
    setDone(undefined);
  }

  async function upload(): Promise<void> {
    setProblems([]);
    setDone(undefined);
    setProgress(0);
    const results = await startUpload(files, {
      pressId: target.pressId,
      componentId: componentId || undefined,
      serviceEntryId: target.serviceEntryId,
      problemReportId: target.problemReportId,
      inspectionItemId: target.inspectionItemId,
      kind,
      caption: caption || undefined,
    });
    if (!results) return;
    const stored: string[] = [];
    const refused: string[] = [];
    for (const r of results) {
      if ("photoId" in r.serverData) stored.push(r.serverData.photoId);
      else refused.push(`${r.name}: ${r.serverData.error}`);
    }
    setProblems(refused);
    if (stored.length > 0) {
      setDone(`${stored.length === 1 ? "1 photo" : `${stored.length} photos`} added.`);
      setFiles([]);
      setCaption("");
      onUploaded?.(stored);
    } else {
      setFiles([]);
    }
  }

  return (
    <section aria-label="Add photos" className="rounded-md bg-steel-50 p-3 ring-1 ring-steel-200">
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-[10rem_minmax(0,14rem)_1fr]">
        <SelectField name="kind" id={`${id}-kind`} label="Shows" options={PHOTO_KIND_OPTIONS} value={kind} onChange={(e) => setKind(e.target.value as PhotoKind)} />
        {parts.length > 0 && !target.componentId ? (
          <SelectField
            name="componentId"
            id={`${id}-part`}
            label="Part (optional)"
            options={[{ value: "", label: "The press as a whole" }, ...parts.map((p) => ({ value: p.id, label: p.label }))]}
            value={componentId}
            onChange={(e) => setComponentId(e.target.value)}
          />
        ) : null}
        <Field
          name="caption"
          id={`${id}-caption`}
          label="Caption (optional)"
          value={caption}
          maxLength={MAX_CAPTION_LENGTH}
          placeholder="e.g. Hairline crack at the gusset weld"
          onChange={(e) => setCaption(e.target.value)}
          className={parts.length > 0 && !target.componentId ? "sm:col-span-2 lg:col-span-1" : "lg:col-span-2"}
        />
      </div>

      <input ref={pickRef} id={`${id}-files`} type="file" accept="image/*" multiple className="sr-only" tabIndex={-1} onChange={choose} aria-label="Choose photos" />
      <input ref={cameraRef} type="file" accept="image/*" capture="environment" className="sr-only" tabIndex={-1} onChange={choose} aria-label="Take a photo" />

      <div className="mt-3 flex flex-wrap items-center gap-2">
        <Button type="button" variant="secondary" disabled={isUploading} onClick={() => pickRef.current?.click()}>
          Choose photos…
        </Button>
        {/* Only on touch devices, where capture opens the rear camera; elsewhere it would be a second file picker. */}
        <span className="hidden pointer-coarse:contents">
          <Button type="button" variant="secondary" disabled={isUploading} onClick={() => cameraRef.current?.click()}>
            Take a photo
          </Button>
        </span>
        <Button type="button" disabled={files.length === 0 || isUploading} onClick={() => void upload()}>
          {isUploading ? `Uploading… ${progress} %` : files.length > 1 ? `Upload ${files.length} photos` : "Upload photo"}
        </Button>
        <span className="text-xs text-steel-600">JPEG, PNG or WebP, up to 8 MB each, {MAX_PHOTOS_PER_UPLOAD} at a time. Location data is removed.</span>
      </div>

      {isUploading ? <progress value={progress} max={100} className="mt-3 h-2 w-full accent-oil-500" aria-label="Upload progress" /> : null}

      {files.length > 0 && !isUploading ? (
        <ul className="mt-3 flex flex-wrap gap-2" aria-label="Photos to upload">
          {files.map((f, i) => (
            <li key={`${f.name}-${i}`} className="flex items-center gap-1 rounded bg-white py-1 pl-2 pr-1 text-xs ring-1 ring-steel-200">
              <span className="max-w-48 truncate">{f.name}</span>
              <span className="font-mono text-steel-500">{formatBytes(f.size)}</span>
              <button type="button" onClick={() => setFiles(files.filter((_, j) => j !== i))} className="rounded px-1.5 text-base leading-none text-steel-600 hover:bg-steel-100" aria-label={`Remove ${f.name}`}>
                ×
              </button>
            </li>
          ))}
        </ul>
      ) : null}

      {problems.length > 0 ? (
        <ul role="alert" className="mt-3 flex flex-col gap-1 rounded-md bg-fail-soft px-3 py-2 text-sm text-fail ring-1 ring-fail/30">
          {problems.map((p) => (
            <li key={p}>{p}</li>
          ))}
        </ul>
      ) : null}
      {done ? (
        <div className="mt-3">
          <FormMessage tone="success" message={done} />
        </div>
      ) : null}
    </section>
  );
}
