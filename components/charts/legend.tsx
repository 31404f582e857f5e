// A row of colour keys under a chart; the same list goes into the PNG download.
import type { ImageLegend } from "./export-image";

export function ChartLegend({ items }: { items: ImageLegend }) {
  return (
    <ul className="mt-3 flex flex-wrap gap-x-4 gap-y-1.5 text-xs text-ink-2">
      {items.map((i) => (
        <li key={i.label} className="flex items-center gap-1.5">
          <span aria-hidden className="inline-block h-2.5 w-2.5 rounded-sm" style={{ background: i.colour }} />
          {i.label}
        </li>
      ))}
    </ul>
  );
}
