"use client";
// Two photos side by side (stacked on a phone), each with its own zoom, its case and its tags:
// e.g. this spall beside a similar case's spall.
import Link from "next/link";
import type { ReactNode } from "react";
import type { PhotoView } from "@/lib/photos/view";
import { ZoomIcon } from "./icons";
import { PhotoFactList, PhotoTagLine } from "./photo-facts";
import type { FindingOption } from "./tag-values";
import { useZoomPan } from "./use-zoom-pan";

export type ComparedPhoto = { photo: PhotoView; caseNumber: string; findings: FindingOption[] };

function ComparePane({ side, entry, changeHref }: { side: "A" | "B"; entry: ComparedPhoto; changeHref: string }) {
  const zoom = useZoomPan();
  const { photo } = entry;
  return (
    <figure className="flex min-w-0 flex-col overflow-hidden rounded-xl border border-line bg-surface" data-testid={`compare-${side}`}>
      <div className="flex items-center justify-between gap-2 border-b border-line px-3 py-2">
        <p className="flex min-w-0 items-center gap-2 text-sm">
          <span className="grid h-6 w-6 shrink-0 place-items-center rounded-full bg-ink text-xs font-semibold text-surface">{side}</span>
          <Link href={`/cases/${entry.caseNumber}/photos`} className="truncate font-medium tabular text-accent hover:underline">
            {entry.caseNumber}
          </Link>
        </p>
        <div className="flex items-center gap-1 text-ink-2">
          <button
            type="button"
            onClick={() => zoom.zoomBy(1 / 1.5)}
            className="grid h-9 w-9 place-items-center rounded-md hover:bg-surface-2"
            aria-label={`Zoom out of ${side}`}
          >
            <ZoomIcon out width={18} height={18} />
          </button>
          <button
            type="button"
            onClick={() => zoom.zoomBy(1.5)}
            className="grid h-9 w-9 place-items-center rounded-md hover:bg-surface-2"
            aria-label={`Zoom into ${side}`}
          >
            <ZoomIcon width={18} height={18} />
          </button>
          <Link href={changeHref} className="ml-1 rounded-md px-2 py-1.5 text-sm text-muted hover:bg-surface-2 hover:text-ink">
            Change
          </Link>
        </div>
      </div>
      <div
        ref={zoom.ref}
        {...zoom.handlers}
        className={`relative aspect-[4/3] touch-none select-none overflow-hidden bg-[#06090f] ${zoom.view.scale > 1 ? "cursor-grab" : "cursor-zoom-in"}`}
      >
        {/* eslint-disable-next-line @next/next/no-img-element */}
        <img
          src={photo.urls.screen}
          alt={photo.caption || `Photo ${side}`}
          draggable={false}
          style={zoom.style}
          className="pointer-events-none absolute inset-0 h-full w-full object-contain"
        />
      </div>
      <figcaption className="flex flex-col gap-3 p-3 sm:p-4">
        <PhotoTagLine photo={photo} findings={entry.findings} />
        <details className="text-sm">
          <summary className="cursor-pointer text-accent">Photo details</summary>
          <div className="mt-2">
            <PhotoFactList photo={photo} />
          </div>
        </details>
      </figcaption>
    </figure>
  );
}

export function ComparePhotos({
  a,
  b,
  changeA,
  changeB,
  picker,
}: {
  a: ComparedPhoto;
  b: ComparedPhoto | null;
  changeA: string;
  changeB: string;
  picker?: ReactNode;
}) {
  return (
    <div className="grid gap-4 md:grid-cols-2">
      <ComparePane side="A" entry={a} changeHref={changeA} />
      {b ? <ComparePane side="B" entry={b} changeHref={changeB} /> : picker}
    </div>
  );
}
