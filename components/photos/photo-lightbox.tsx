"use client";
// The lightbox: one photo at screen size with zoom and pan, arrows / swipe between photos,
// and a panel with its tags, facts, original, compare, tag editing and delete.
import Link from "next/link";
import { useCallback, useEffect, useRef, useState } from "react";
import { Button, buttonClass } from "@/components/ui/button";
import type { PhotoView } from "@/lib/photos/view";
import { ChevronIcon, CloseIcon, CompareIcon, ZoomIcon } from "./icons";
import { PhotoFactList, PhotoTagLine, photoAlt, photoTitle } from "./photo-facts";
import { TagFields } from "./tag-fields";
import { tagsForApi, tagsOf, type FindingOption, type TagValues } from "./tag-values";
import { deletePhoto, patchPhoto } from "./upload-request";
import { useZoomPan } from "./use-zoom-pan";

type Props = {
  photos: PhotoView[];
  index: number;
  findings: FindingOption[];
  canTag: boolean;
  canDelete: boolean;
  onIndex: (i: number) => void;
  onClose: () => void;
  onChanged: (p: PhotoView) => void;
  onDeleted: (id: string) => void;
};

const typing = (t: EventTarget | null) =>
  t instanceof HTMLElement && (t.isContentEditable || ["INPUT", "TEXTAREA", "SELECT"].includes(t.tagName));

export function PhotoLightbox({ photos, index, findings, canTag, canDelete, onIndex, onClose, onChanged, onDeleted }: Props) {
  const photo = photos[index];
  const count = photos.length;
  const go = useCallback((step: 1 | -1) => count > 1 && onIndex((index + step + count) % count), [count, index, onIndex]);
  const zoom = useZoomPan(go);
  const { reset } = zoom;
  const [editing, setEditing] = useState<TagValues | null>(null);
  const [details, setDetails] = useState(false);
  const [confirmDelete, setConfirmDelete] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const dialog = useRef<HTMLDivElement>(null);
  const strip = useRef<HTMLOListElement>(null);

  useEffect(() => {
    strip.current?.querySelector('[aria-current="true"]')?.scrollIntoView({ block: "nearest", inline: "nearest" });
  }, [index]);

  useEffect(() => {
    reset();
    setEditing(null);
    setConfirmDelete(false);
    setProblem(null);
  }, [photo?.id, reset]);

  useEffect(() => {
    const opener = document.activeElement as HTMLElement | null;
    const overflow = document.body.style.overflow;
    document.body.style.overflow = "hidden";
    dialog.current?.focus();
    return () => {
      document.body.style.overflow = overflow;
      opener?.focus?.();
    };
  }, []);

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (typing(e.target)) {
        if (e.key === "Escape") setEditing(null);
        return;
      }
      if (e.key === "Escape") onClose();
      else if (e.key === "ArrowRight") go(1);
      else if (e.key === "ArrowLeft") go(-1);
      else if (e.key === "+" || e.key === "=") zoom.zoomBy(1.5);
      else if (e.key === "-") zoom.zoomBy(1 / 1.5);
      else if (e.key === "0") reset();
      else return;
      e.preventDefault();
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [go, onClose, reset, zoom]);

  // The neighbours load while this photo is looked at, so stepping through feels instant.
  useEffect(() => {
    for (const step of [1, -1]) {
      const n = photos[(index + step + count) % count];
      if (n) new Image().src = n.urls.screen;
    }
  }, [count, index, photos]);

  if (!photo) return null;

  const save = async () => {
    if (!editing) return;
    setBusy(true);
    const res = await patchPhoto(photo.id, tagsForApi(editing));
    setBusy(false);
    if (!res.ok) return setProblem(res.message);
    onChanged(res.photo);
    setEditing(null);
  };
  const remove = async () => {
    setBusy(true);
    const res = await deletePhoto(photo.id);
    setBusy(false);
    if (!res.ok) return setProblem(res.message);
    onDeleted(photo.id);
  };

  const navButton =
    "absolute top-1/2 z-10 hidden h-12 w-12 -translate-y-1/2 place-items-center rounded-full bg-black/45 text-white backdrop-blur hover:bg-black/70 sm:grid";

  return (
    <div
      ref={dialog}
      tabIndex={-1}
      role="dialog"
      aria-modal="true"
      aria-label={`Photo ${index + 1} of ${count}: ${photoTitle(photo)}`}
      className="fixed inset-0 z-50 flex flex-col bg-[#06090f] text-white outline-none lg:flex-row"
      data-testid="lightbox"
    >
      <div className="relative flex min-h-0 flex-1 flex-col">
        <div className="flex items-center justify-between gap-3 px-3 py-2.5 sm:px-4">
          <p className="min-w-0 truncate text-sm text-white/80">
            <span className="tabular text-white">{index + 1}</span> / {count} · {photoTitle(photo)}
          </p>
          <div className="flex shrink-0 items-center gap-1">
            <button
              type="button"
              onClick={() => zoom.zoomBy(1 / 1.5)}
              className="hidden h-10 w-10 place-items-center rounded-full hover:bg-white/10 sm:grid"
              aria-label="Zoom out"
            >
              <ZoomIcon out />
            </button>
            <span className="hidden w-12 text-center text-xs tabular text-white/70 sm:inline">{Math.round(zoom.view.scale * 100)}%</span>
            <button
              type="button"
              onClick={() => zoom.zoomBy(1.5)}
              className="hidden h-10 w-10 place-items-center rounded-full hover:bg-white/10 sm:grid"
              aria-label="Zoom in"
            >
              <ZoomIcon />
            </button>
            <button
              type="button"
              onClick={onClose}
              className="grid h-11 w-11 place-items-center rounded-full hover:bg-white/10"
              aria-label="Close (Esc)"
              data-testid="lightbox-close"
            >
              <CloseIcon />
            </button>
          </div>
        </div>
        <div
          ref={zoom.ref}
          {...zoom.handlers}
          className={`relative min-h-0 flex-1 touch-none select-none overflow-hidden ${zoom.view.scale > 1 ? "cursor-grab active:cursor-grabbing" : "cursor-zoom-in"}`}
        >
          {/* eslint-disable-next-line @next/next/no-img-element */}
          <img
            key={photo.id}
            src={photo.urls.screen}
            alt={photo.caption || photoTitle(photo)}
            draggable={false}
            style={zoom.style}
            className="pointer-events-none absolute inset-0 h-full w-full object-contain will-change-transform"
            data-testid="lightbox-image"
          />
          {count > 1 ? (
            <>
              <button
                type="button"
                onPointerDown={(e) => e.stopPropagation()}
                onClick={() => go(-1)}
                className={`${navButton} left-3`}
                aria-label="Previous photo (←)"
              >
                <ChevronIcon dir="left" />
              </button>
              <button
                type="button"
                onPointerDown={(e) => e.stopPropagation()}
                onClick={() => go(1)}
                className={`${navButton} right-3`}
                aria-label="Next photo (→)"
              >
                <ChevronIcon />
              </button>
            </>
          ) : null}
        </div>
        {count > 1 ? (
          <ol
            ref={strip}
            className="mx-auto hidden w-max max-w-full shrink-0 gap-1.5 overflow-x-auto px-4 pt-2 sm:flex [scrollbar-width:none]"
            aria-label="All photos"
          >
            {photos.map((p, i) => (
              <li key={p.id}>
                <button
                  type="button"
                  onClick={() => onIndex(i)}
                  aria-label={`Photo ${i + 1}`}
                  aria-current={i === index}
                  className={`block h-12 w-12 overflow-hidden rounded-md ring-2 transition ${i === index ? "opacity-100 ring-accent" : "opacity-55 ring-transparent hover:opacity-90"}`}
                >
                  {/* eslint-disable-next-line @next/next/no-img-element */}
                  <img src={p.urls.thumb} alt={photoAlt(p)} loading="lazy" className="h-full w-full object-cover" />
                </button>
              </li>
            ))}
          </ol>
        ) : null}
        <p className="hidden px-4 py-2 text-center text-xs text-white/45 sm:block">
          Click to zoom · scroll or pinch to zoom further · drag to move · ← → to step · Esc to close
        </p>
      </div>

      <aside
        className={`flex max-h-[48dvh] shrink-0 flex-col overflow-y-auto border-t border-white/10 bg-surface text-ink lg:max-h-none lg:w-[360px] lg:border-l lg:border-t-0 ${details || editing ? "" : "max-lg:max-h-[30dvh]"}`}
      >
        <div className="flex flex-col gap-4 p-4">
          {editing ? (
            <>
              <TagFields value={editing} onChange={setEditing} findings={findings} layout="stack" />
              {problem ? (
                <p className="text-sm text-danger" role="alert">
                  {problem}
                </p>
              ) : null}
              <div className="flex justify-end gap-2">
                <Button variant="ghost" onClick={() => setEditing(null)}>
                  Cancel
                </Button>
                <Button onClick={save} disabled={busy}>
                  Save tags
                </Button>
              </div>
            </>
          ) : (
            <>
              <PhotoTagLine photo={photo} findings={findings} />
              <button
                type="button"
                className="inline-flex min-h-11 items-center self-start text-sm text-accent hover:underline lg:hidden"
                onClick={() => setDetails((v) => !v)}
                aria-expanded={details}
              >
                {details ? "Hide details" : "Details and actions"}
              </button>
              <div className={`${details ? "flex" : "hidden"} flex-col gap-4 lg:flex`}>
                <PhotoFactList photo={photo} />
                <div className="flex flex-wrap gap-2">
                  <a
                    href={photo.urls.original}
                    target="_blank"
                    rel="noreferrer"
                    className={buttonClass({ variant: "secondary", size: "sm" })}
                  >
                    Open original
                  </a>
                  <a href={`${photo.urls.original}?download=1`} className={buttonClass({ variant: "secondary", size: "sm" })}>
                    Download
                  </a>
                  <Link href={`/photos/compare?a=${photo.id}`} className={buttonClass({ variant: "secondary", size: "sm" })}>
                    <CompareIcon width={16} height={16} /> Compare
                  </Link>
                </div>
                {canTag || (canDelete && photo.canDelete !== false) ? (
                  <div className="flex flex-wrap items-center gap-2 border-t border-line pt-4">
                    {canTag ? (
                      <Button
                        size="sm"
                        onClick={() => {
                          setProblem(null);
                          setEditing(tagsOf(photo));
                        }}
                      >
                        Edit tags
                      </Button>
                    ) : null}
                    {canDelete && photo.canDelete !== false ? (
                      confirmDelete ? (
                        <>
                          <Button variant="danger" size="sm" onClick={remove} disabled={busy}>
                            Delete for good
                          </Button>
                          <Button variant="ghost" size="sm" onClick={() => setConfirmDelete(false)}>
                            Keep it
                          </Button>
                        </>
                      ) : (
                        <Button variant="ghost" size="sm" className="text-danger" onClick={() => setConfirmDelete(true)}>
                          Delete…
                        </Button>
                      )
                    ) : null}
                  </div>
                ) : null}
                {confirmDelete ? (
                  <p className="text-sm text-muted">
                    The original and its copies are removed from the casebook; the case history keeps a note of it.
                  </p>
                ) : null}
                {problem ? (
                  <p className="text-sm text-danger" role="alert">
                    {problem}
                  </p>
                ) : null}
              </div>
            </>
          )}
        </div>
      </aside>
    </div>
  );
}
