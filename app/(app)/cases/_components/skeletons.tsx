// Grey shapes where rows will be, so the page keeps its layout while the first page loads.
const bar = "h-3.5 animate-pulse rounded bg-line";
const widths = ["w-24", "w-28", "w-20", "w-16", "w-32", "w-14", "w-24", "w-20", "w-28", "w-16"];

export function TableSkeleton({ columns, rows = 8 }: { columns: number; rows?: number }) {
  return (
    <div className="hidden md:block" aria-hidden data-testid="case-skeleton">
      <div className="h-10 border-b border-line bg-surface-2" />
      {Array.from({ length: rows }, (_, r) => (
        <div key={r} className="flex items-center gap-6 border-b border-line px-5 py-3.5">
          {Array.from({ length: columns }, (_, c) => (
            <div key={c} className={`${bar} ${widths[(r + c) % widths.length]} shrink-0`} />
          ))}
        </div>
      ))}
    </div>
  );
}

export function CardSkeleton({ rows = 6 }: { rows?: number }) {
  return (
    <ul className="divide-y divide-line md:hidden" aria-hidden>
      {Array.from({ length: rows }, (_, r) => (
        <li key={r} className="space-y-2.5 px-4 py-4">
          <div className="flex justify-between">
            <div className={`${bar} w-28`} />
            <div className={`${bar} w-20 rounded-full`} />
          </div>
          <div className={`${bar} w-44`} />
          <div className={`${bar} w-56`} />
        </li>
      ))}
    </ul>
  );
}
