// Every cause's quick fit (maximum likelihood with Fisher bounds); pick one to see it in full.
// Figures far past the longest observed life print as words, never as a bare seven-digit number.
import Link from "next/link";
import type { LifeSummary } from "@/lib/tallies/life";
import { cautionTags, lifeFigure } from "@/lib/tallies/life-cautions";
import { ShapeBadge } from "./shape-badge";

const num = (v: number) => (v >= 1000 ? Math.round(v).toLocaleString("en-US") : v >= 100 ? v.toFixed(0) : v.toFixed(1));
const figure = (v: number, longest: number) => lifeFigure(v, longest, num);

export function CauseTable({
  causes,
  selected,
  hrefFor,
  unit,
}: {
  causes: LifeSummary[];
  selected: string | null;
  hrefFor: (cause: string) => string;
  unit: string;
}) {
  return (
    <div className="overflow-x-auto rounded-lg border border-line" tabIndex={0} role="region" aria-label="Weibull fit per root cause">
      <table className="w-full border-collapse text-sm" data-life-causes>
        <caption className="sr-only">Weibull fit per root cause</caption>
        <thead className="bg-surface-2 text-xs text-muted">
          <tr>
            <th scope="col" className="px-2 py-2 text-left font-semibold">
              Root cause
            </th>
            <th scope="col" className="px-2 py-2 text-right font-semibold">
              Failures
            </th>
            <th scope="col" className="whitespace-nowrap px-2 py-2 text-right font-semibold">
              β, shape
            </th>
            <th scope="col" className="whitespace-nowrap px-2 py-2 text-right font-semibold">{`η (${unit})`}</th>
            <th scope="col" className="whitespace-nowrap px-2 py-2 text-right font-semibold">{`B10 (${unit})`}</th>
          </tr>
        </thead>
        <tbody>
          {causes.map((c) => {
            const on = c.cause === selected;
            return (
              <tr key={c.cause} className={`border-t border-line ${on ? "bg-accent-soft/60" : "hover:bg-surface-2"}`}>
                <th scope="row" className="px-2 py-2 text-left font-medium">
                  <Link
                    href={hrefFor(c.cause)}
                    aria-current={on ? "true" : undefined}
                    scroll={false}
                    className={`inline-flex min-h-11 min-w-11 items-center hover:text-accent lg:min-h-0 ${on ? "text-accent" : "text-ink"}`}
                  >
                    {c.label}
                  </Link>
                  {c.cautions.length ? (
                    <span className="mt-0.5 block text-xs font-normal text-warn" data-life-caution-tags>
                      <span aria-hidden>⚠ </span>
                      {cautionTags(c.cautions)}
                    </span>
                  ) : null}
                </th>
                <td className="px-2 py-2 text-right tabular text-ink-2">{c.failures.toLocaleString("en-US")}</td>
                {c.fit ? (
                  <>
                    {/* The shape's reading sits under β, not in a column of its own, so the table fits its card on a desk. */}
                    <td className="px-2 py-2 text-right tabular text-ink-2">
                      <span className="block">{c.fit.beta.toFixed(2)}</span>
                      <span className="mt-1 inline-block">
                        <ShapeBadge reading={c.fit.shapeReading} />
                      </span>
                    </td>
                    <td className="whitespace-nowrap px-2 py-2 text-right tabular text-ink-2">{figure(c.fit.eta, c.longestLife)}</td>
                    <td className="whitespace-nowrap px-2 py-2 text-right tabular text-ink-2">{figure(c.fit.b10, c.longestLife)}</td>
                  </>
                ) : (
                  <td colSpan={3} className="px-2 py-2 text-xs text-muted">
                    {c.note}
                  </td>
                )}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
