import type { ReactNode } from "react";

export function Facts({ items }: { items: [string, ReactNode][] }) {
  return (
    <dl className="grid grid-cols-2 gap-x-4 gap-y-3 text-sm sm:grid-cols-3 lg:grid-cols-4">
      {items.map(([k, v]) => (
        <div key={k} className="min-w-0">
          <dt className="text-xs text-muted">{k}</dt>
          <dd className="mt-0.5 break-words font-medium text-ink">
            {v === null || v === undefined || v === "" ? <span className="text-muted">—</span> : v}
          </dd>
        </div>
      ))}
    </dl>
  );
}
