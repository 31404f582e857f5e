// The photos of a similar case: the same part from both cases side by side, with the way to
// the full comparison; or the similar case's first photo where no part was photographed in both.
import Link from "next/link";
import type { SimilarCaseItem } from "@/lib/cases/types";

const thumb = (id: string) => `/api/photos/${encodeURIComponent(id)}/thumb`;

function Thumb({ id, caption }: { id: string; caption: string }) {
  return (
    <figure className="min-w-0">
      {/* A plain img: the bytes come from the session-checked photo route, not a static asset. */}
      {/* eslint-disable-next-line @next/next/no-img-element -- see above */}
      <img
        src={thumb(id)}
        alt={caption}
        loading="lazy"
        className="aspect-[4/3] w-full rounded-md border border-line bg-surface-2 object-cover"
      />
      <figcaption className="mt-0.5 truncate text-[11px] text-muted">{caption}</figcaption>
    </figure>
  );
}

export function SimilarPhotos({ item, thisNumber }: { item: SimilarCaseItem; thisNumber: string }) {
  const pair = item.photoPair;
  if (pair) {
    return (
      <div className="w-full sm:w-56" data-testid="photo-pair">
        <div className="grid grid-cols-2 gap-1.5">
          <Thumb id={pair.a} caption={`${pair.componentLabel} · this case (${thisNumber})`} />
          <Thumb id={pair.b} caption={`${pair.componentLabel} · ${item.number}`} />
        </div>
        <Link
          href={`/photos/compare?a=${encodeURIComponent(pair.a)}&b=${encodeURIComponent(pair.b)}`}
          className="mt-1 inline-block text-xs font-medium text-accent hover:underline"
          data-testid="compare-photos"
        >
          Compare photos
        </Link>
      </div>
    );
  }
  if (item.photoId) {
    return (
      <div className="w-28">
        <Thumb id={item.photoId} caption={item.number} />
      </div>
    );
  }
  return null;
}
