"use client";
// One file in the upload queue: preview, progress, what happened, and retry / tags / remove.
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { formatBytes } from "@/lib/photos/limits";
import { CloseIcon, PhotoIcon, RetryIcon, TagIcon } from "./icons";
import { TagFields } from "./tag-fields";
import type { FindingOption, TagValues } from "./tag-values";
import type { QueueItem } from "./use-upload-queue";

const STATUS_TEXT: Record<QueueItem["status"], string> = {
  waiting: "Waiting…",
  uploading: "Uploading",
  done: "Added",
  duplicate: "Already in this case",
  failed: "Not added",
};

type Props = {
  item: QueueItem;
  findings: FindingOption[];
  onRetry: () => void;
  onRemove: () => void;
  onTags: (tags: TagValues) => Promise<string | null>;
};

export function UploadItem({ item, findings, onRetry, onRemove, onTags }: Props) {
  const [editing, setEditing] = useState(false);
  const [draft, setDraft] = useState(item.tags);
  const [error, setError] = useState<string | null>(null);
  const [saving, setSaving] = useState(false);
  const [previewFailed, setPreviewFailed] = useState(false);
  const pct = Math.round(item.progress * 100);
  const tone = item.status === "failed" ? "text-danger" : item.status === "done" ? "text-ok" : "text-muted";

  return (
    <li className="rounded-lg border border-line bg-surface p-2.5" data-testid="upload-item" data-status={item.status}>
      <div className="flex items-center gap-3">
        <div className="grid h-12 w-12 shrink-0 place-items-center overflow-hidden rounded-md bg-surface-2 text-muted">
          {item.preview && !previewFailed ? (
            // eslint-disable-next-line @next/next/no-img-element -- a local blob: preview, nothing to optimise
            <img src={item.preview} alt="" className="h-full w-full object-cover" onError={() => setPreviewFailed(true)} />
          ) : (
            <PhotoIcon />
          )}
        </div>
        <div className="min-w-0 flex-1">
          <div className="flex items-baseline justify-between gap-2">
            <p className="truncate text-sm font-medium text-ink" title={item.file.name}>
              {item.file.name || "photo"}
            </p>
            <span className="shrink-0 text-xs tabular text-muted">{formatBytes(item.file.size)}</span>
          </div>
          {item.status === "uploading" || item.status === "waiting" ? (
            <div className="mt-1.5 flex items-center gap-2">
              <div
                className="h-1.5 flex-1 overflow-hidden rounded-full bg-surface-2 ring-1 ring-inset ring-line"
                role="progressbar"
                aria-valuenow={pct}
                aria-valuemin={0}
                aria-valuemax={100}
                aria-label={`Upload of ${item.file.name}`}
              >
                <div
                  className="h-full rounded-full bg-accent transition-[width] duration-200"
                  style={{ width: `${item.status === "waiting" ? 0 : Math.max(3, pct)}%` }}
                />
              </div>
              <span className="w-16 text-right text-xs tabular text-muted">
                {item.status === "waiting" ? STATUS_TEXT.waiting : pct >= 100 ? "Processing" : `${pct}%`}
              </span>
            </div>
          ) : (
            <p className={`mt-0.5 text-xs ${tone}`} role={item.status === "failed" ? "alert" : undefined}>
              <span className="font-medium">{STATUS_TEXT[item.status]}</span>
              {item.message && item.status !== "done" ? <span className="text-ink-2"> — {item.message}</span> : null}
            </p>
          )}
        </div>
        <div className="flex shrink-0 items-center gap-0.5">
          {item.status === "failed" ? (
            <Button variant="secondary" size="sm" onClick={onRetry} aria-label={`Retry ${item.file.name}`}>
              <RetryIcon width={16} height={16} /> <span className="hidden sm:inline">Retry</span>
            </Button>
          ) : null}
          <button
            type="button"
            onClick={() => {
              setDraft(item.tags);
              setEditing((v) => !v);
            }}
            className="grid h-9 w-9 place-items-center rounded-md text-ink-2 hover:bg-surface-2"
            aria-label={`Tags of ${item.file.name}`}
            aria-expanded={editing}
          >
            <TagIcon width={18} height={18} />
          </button>
          {item.status !== "done" && item.status !== "duplicate" ? (
            <button
              type="button"
              onClick={onRemove}
              className="grid h-9 w-9 place-items-center rounded-md text-muted hover:bg-surface-2 hover:text-ink"
              aria-label={item.status === "uploading" ? `Cancel ${item.file.name}` : `Remove ${item.file.name} from the list`}
            >
              <CloseIcon width={18} height={18} />
            </button>
          ) : null}
        </div>
      </div>
      {editing ? (
        <div className="mt-3 border-t border-line pt-3">
          <TagFields value={draft} onChange={setDraft} findings={findings} />
          {error ? (
            <p className="mt-2 text-sm text-danger" role="alert">
              {error}
            </p>
          ) : null}
          <div className="mt-3 flex justify-end gap-2">
            <Button variant="ghost" size="sm" onClick={() => setEditing(false)}>
              Cancel
            </Button>
            <Button
              size="sm"
              disabled={saving}
              onClick={async () => {
                setSaving(true);
                const problem = await onTags(draft);
                setSaving(false);
                setError(problem);
                if (!problem) setEditing(false);
              }}
            >
              {item.photo ? "Save tags" : "Use these tags"}
            </Button>
          </div>
        </div>
      ) : null}
    </li>
  );
}
