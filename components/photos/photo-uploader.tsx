"use client";
// Drop many photos at once, or take them with the phone camera; tags chosen here go with each new file.
import { useState } from "react";
import { useDropzone, type FileRejection } from "react-dropzone";
import { Button, buttonClass } from "@/components/ui/button";
import { componentLabel } from "@/lib/photos/grouping";
import { clockWords } from "@/lib/damage-map/geometry";
import { formatBytes } from "@/lib/photos/limits";
import { refuse } from "@/lib/photos/refusal";
import type { PhotoView } from "@/lib/photos/view";
import { CameraIcon, UploadIcon } from "./icons";
import { TagFields } from "./tag-fields";
import { EMPTY_TAGS, type FindingOption, type TagValues } from "./tag-values";
import { UploadItem } from "./upload-item";
import { useUploadQueue } from "./use-upload-queue";

// What the file picker offers; the server still judges every file by its content.
const ACCEPT = {
  "image/jpeg": [".jpg", ".jpeg"],
  "image/png": [".png"],
  "image/webp": [".webp"],
  "image/heic": [".heic"],
  "image/heif": [".heif"],
};

function defaultsSummary(t: TagValues, findings: FindingOption[]): string {
  const parts = [
    t.component && componentLabel(t.component),
    t.row && `${t.row} row`,
    t.clockDeg !== "" && clockWords(Number(t.clockDeg)),
    t.findingId && findings.find((f) => f.id === t.findingId)?.label,
  ].filter(Boolean);
  return parts.length ? parts.join(" · ") : "none — tag each photo later";
}

type Props = { caseId: string; findings: FindingOption[]; maxBytes: number; onStored: (p: PhotoView) => void };

export function PhotoUploader({ caseId, findings, maxBytes, onStored }: Props) {
  const queue = useUploadQueue(`/api/cases/${caseId}/photos`, onStored);
  const [defaults, setDefaults] = useState<TagValues>(EMPTY_TAGS);
  const [showDefaults, setShowDefaults] = useState(false);

  const addFiles = (files: File[]) => {
    // Too large is known before sending; no need to wait for a phone to push 40 MB first.
    queue.add(
      files.filter((f) => f.size <= maxBytes),
      defaults,
    );
    for (const f of files.filter((f) => f.size > maxBytes)) queue.reject(f, refuse.tooLarge(f.name, f.size, maxBytes).message);
  };
  const onDrop = (accepted: File[], rejected: FileRejection[]) => {
    addFiles(accepted);
    for (const r of rejected) queue.reject(r.file, `“${r.file.name}” is not a photo type Tearline keeps. Use JPEG, PNG, WebP or HEIC.`);
  };
  const { getRootProps, getInputProps, isDragActive, open } = useDropzone({
    onDrop,
    accept: ACCEPT,
    multiple: true,
    noClick: true,
    noKeyboard: true,
  });
  const finished = queue.items.filter((i) => i.status === "done" || i.status === "duplicate").length;
  const active = queue.items.filter((i) => i.status === "uploading" || i.status === "waiting").length;

  return (
    <div className="flex flex-col gap-3">
      <div
        {...getRootProps()}
        className={`relative flex flex-col items-center gap-4 rounded-xl border-2 border-dashed px-4 py-6 text-center transition sm:flex-row sm:px-5 sm:py-5 sm:text-left ${isDragActive ? "border-accent bg-accent-soft" : "border-line-strong bg-surface-2"}`}
        data-testid="photo-dropzone"
      >
        <input {...getInputProps()} data-testid="photo-drop-input" aria-label="Choose photos" />
        <div className="grid h-11 w-11 shrink-0 place-items-center rounded-full bg-surface text-accent ring-1 ring-line">
          <UploadIcon />
        </div>
        <div className="min-w-0 flex-1">
          <p className="font-medium text-ink">
            {isDragActive ? (
              "Drop to upload"
            ) : (
              <>
                <span className="hidden sm:inline">Drop photos here, as many as you like</span>
                <span className="sm:hidden">Add photos</span>
              </>
            )}
          </p>
          <p className="mt-0.5 text-sm text-muted">
            JPEG, PNG, WebP or HEIC, up to {formatBytes(maxBytes)} each. Originals are kept unchanged as evidence.
          </p>
        </div>
        <div className="flex w-full shrink-0 flex-col gap-2 sm:w-auto sm:flex-row">
          <label className={buttonClass({ variant: "primary", size: "lg" }, "cursor-pointer sm:hidden")}>
            <CameraIcon /> Take photo
            <input
              type="file"
              accept="image/*"
              capture="environment"
              multiple
              className="sr-only"
              data-testid="photo-camera-input"
              onChange={(e) => {
                addFiles(Array.from(e.target.files ?? []));
                e.target.value = "";
              }}
            />
          </label>
          <Button variant="secondary" size="md" onClick={open} className="h-12 sm:h-10">
            Choose files
          </Button>
        </div>
      </div>

      <div className="rounded-lg border border-line bg-surface">
        <button
          type="button"
          className="flex w-full items-center justify-between gap-3 px-3 py-2.5 text-left text-sm"
          onClick={() => setShowDefaults((v) => !v)}
          aria-expanded={showDefaults}
        >
          <span className="min-w-0">
            <span className="font-medium text-ink-2">Tags for the next photos: </span>
            <span className="text-muted">{defaultsSummary(defaults, findings)}</span>
          </span>
          <span className="shrink-0 text-accent">{showDefaults ? "Done" : "Set"}</span>
        </button>
        {showDefaults ? (
          <div className="border-t border-line px-3 py-3">
            <TagFields value={defaults} onChange={setDefaults} findings={findings} withCaption={false} />
            <p className="mt-2 text-xs text-muted">
              Set the part before you drop a batch, e.g. twelve photos of the cup raceway. Each photo can still be changed later.
            </p>
          </div>
        ) : null}
      </div>

      {queue.items.length ? (
        <div>
          <div className="mb-2 flex items-center justify-between text-sm">
            <p className="text-muted" aria-live="polite">
              {active ? `Uploading ${active} of ${queue.items.length}…` : `${finished} of ${queue.items.length} added`}
            </p>
            {finished ? (
              <button type="button" className="text-accent hover:underline" onClick={queue.clearFinished}>
                Clear finished
              </button>
            ) : null}
          </div>
          <ul className="flex flex-col gap-2">
            {queue.items.map((item) => (
              <UploadItem
                key={item.key}
                item={item}
                findings={findings}
                onRetry={() => queue.retry(item.key)}
                onRemove={() => queue.remove(item.key)}
                onTags={(t) => queue.setTags(item.key, t)}
              />
            ))}
          </ul>
        </div>
      ) : null}
    </div>
  );
}
