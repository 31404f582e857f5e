import type { Segment } from "@/lib/search/highlight";

/** Text with the words a search matched marked; segments are plain text, never HTML. */
export function MarkedText({ segments }: { segments: readonly Segment[] }) {
  return (
    <>
      {segments.map((s, i) =>
        s.hit ? (
          <mark key={i} className="rounded-[3px] bg-accent-soft px-0.5 font-medium text-ink ring-1 ring-inset ring-accent/25">
            {s.text}
          </mark>
        ) : (
          <span key={i}>{s.text}</span>
        ),
      )}
    </>
  );
}
