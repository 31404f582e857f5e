// The case's photos grouped by part, as tiles that open the lightbox.
import { degToOClock } from "@/lib/photos/clock";
import type { PhotoGroup } from "@/lib/photos/grouping";
import { photoAlt } from "./photo-facts";
import type { PhotoView } from "@/lib/photos/view";

type Props = { groups: PhotoGroup<PhotoView>[]; onOpen: (photo: PhotoView) => void };

export function PhotoGrid({ groups, onOpen }: Props) {
  return (
    <div className="flex flex-col gap-6">
      {groups.map((g) => (
        <section key={g.code} aria-label={g.label}>
          <h3 className="mb-2 flex items-baseline gap-2 text-sm font-semibold text-ink">
            {g.label}
            <span className="font-normal tabular text-muted">{g.photos.length}</span>
          </h3>
          <ul className="grid grid-cols-3 gap-1.5 sm:grid-cols-4 sm:gap-2 md:grid-cols-5 xl:grid-cols-6">
            {g.photos.map((p) => (
              <li key={p.id}>
                <button
                  type="button"
                  onClick={() => onOpen(p)}
                  className="group relative block aspect-square w-full overflow-hidden rounded-lg bg-surface-2 ring-1 ring-line transition hover:ring-2 hover:ring-accent focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-accent"
                  data-testid="photo-tile"
                >
                  {/* Named by what it shows (the picture's alt text and the words on it), so the name holds every visible word. */}
                  <span className="sr-only">Open photo: </span>
                  {/* eslint-disable-next-line @next/next/no-img-element */}
                  <img
                    src={p.urls.thumb}
                    alt={photoAlt(p)}
                    loading="lazy"
                    decoding="async"
                    className="h-full w-full object-cover transition duration-300 group-hover:scale-[1.03]"
                  />
                  {p.clockDeg !== null || p.findingId || p.caption ? (
                    <span className="absolute inset-x-0 bottom-0 flex items-end justify-between gap-1 bg-gradient-to-t from-black/75 via-black/30 to-transparent px-1.5 pb-1 pt-5 text-left text-[11px] leading-tight text-white">
                      <span className="line-clamp-2 min-w-0">{p.caption}</span>
                      <span className="flex shrink-0 gap-1">
                        {p.clockDeg !== null ? (
                          <span className="rounded bg-black/55 px-1 py-px tabular" title={`${p.clockDeg}°`}>
                            {degToOClock(p.clockDeg)}h
                          </span>
                        ) : null}
                        {p.findingId ? (
                          <span className="rounded bg-amber-500/90 px-1 py-px font-semibold text-black" title="Shows a recorded finding">
                            F
                          </span>
                        ) : null}
                      </span>
                    </span>
                  ) : null}
                </button>
              </li>
            ))}
          </ul>
        </section>
      ))}
    </div>
  );
}
