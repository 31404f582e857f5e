import type { ReactNode } from "react";

/** A safety caution beside a step that can hurt someone; always defers to local rules. */
export function Caution({ title = "Safety", children }: { title?: string; children: ReactNode }) {
  return (
    <aside role="note" className="flex gap-3 rounded-lg border border-warn/40 bg-warn-soft px-3.5 py-3 text-sm text-ink-2">
      <span aria-hidden className="mt-0.5 text-lg leading-none text-warn">
        ⚠
      </span>
      <div>
        <p className="font-semibold text-ink">{title}</p>
        <div className="mt-0.5 leading-relaxed">{children}</div>
        <p className="mt-1 text-xs text-muted">
          Always follow your employer&apos;s procedures, the applicable interchange rules and local codes.
        </p>
      </div>
    </aside>
  );
}
