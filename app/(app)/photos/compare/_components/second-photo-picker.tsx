// Choosing photo B: another photo of the same case, or any photo of another case found by its number.
import Link from "next/link";
import { buttonClass } from "@/components/ui/button";
import { Input } from "@/components/ui/field";
import { componentLabel } from "@/lib/photos/grouping";
import { photoAlt } from "@/components/photos/photo-facts";
import type { PhotoView } from "@/lib/photos/view";

type Props = {
  aId: string;
  sameCase: { number: string; photos: PhotoView[] };
  other: { query: string; number: string | null; photos: PhotoView[]; problem: string | null };
};

function Thumbs({ aId, photos }: { aId: string; photos: PhotoView[] }) {
  return (
    <ul className="grid grid-cols-3 gap-1.5 sm:grid-cols-4">
      {photos.map((p) => (
        <li key={p.id}>
          <Link
            href={`/photos/compare?a=${aId}&b=${p.id}`}
            className="group block overflow-hidden rounded-lg ring-1 ring-line hover:ring-2 hover:ring-accent"
            data-testid="pick-photo"
          >
            {/* eslint-disable-next-line @next/next/no-img-element */}
            <img src={p.urls.thumb} alt={photoAlt(p)} loading="lazy" className="aspect-square w-full object-cover" />
            <span className="block truncate bg-surface-2 px-1.5 py-1 text-[11px] text-ink-2">
              {p.component ? componentLabel(p.component) : "Untagged"}
            </span>
          </Link>
        </li>
      ))}
    </ul>
  );
}

export function SecondPhotoPicker({ aId, sameCase, other }: Props) {
  return (
    <section className="flex flex-col gap-5 rounded-xl border border-dashed border-line-strong bg-surface p-4" aria-label="Choose photo B">
      <div>
        <h2 className="font-semibold text-ink">Choose photo B</h2>
        <p className="text-sm text-muted">Put a photo of another case beside this one, or another view of the same part.</p>
      </div>
      <form method="get" action="/photos/compare" className="flex gap-2">
        <input type="hidden" name="a" value={aId} />
        <Input
          name="case"
          defaultValue={other.query}
          placeholder="Case number, e.g. TL-26-00042"
          aria-label="Case number"
          className="tabular"
        />
        <button type="submit" className={buttonClass({ variant: "secondary" }, "shrink-0")}>
          Show photos
        </button>
      </form>
      {other.problem ? (
        <p className="text-sm text-danger" role="alert">
          {other.problem}
        </p>
      ) : null}
      {other.number ? (
        <div>
          <h3 className="mb-2 text-sm font-medium text-ink-2">Photos of {other.number}</h3>
          {other.photos.length ? (
            <Thumbs aId={aId} photos={other.photos} />
          ) : (
            <p className="text-sm text-muted">That case has no photos yet.</p>
          )}
        </div>
      ) : null}
      <div>
        <h3 className="mb-2 text-sm font-medium text-ink-2">Other photos of {sameCase.number}</h3>
        {sameCase.photos.length ? (
          <Thumbs aId={aId} photos={sameCase.photos} />
        ) : (
          <p className="text-sm text-muted">This is the case&apos;s only photo.</p>
        )}
      </div>
    </section>
  );
}
