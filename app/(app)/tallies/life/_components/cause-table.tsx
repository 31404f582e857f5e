// Every cause's quick fit (maximum likelihood with Fisher bounds); pick one to see it in full.
// Figures far past the longest observed life print as words, never as a bare seven-digit number.
import Link from "next/link";
import type { LifeSummary } from "@/lib/tallies/life";
import { cautionTags, lifeFigure } from "@/lib/tallies/life-cautions";
import { ShapeBadge } from "./shape-badge";

const num = (v: number) => (v >= 1000 ? Math.round(v).toLocaleString("en-US") : v >= 100 ? v.toFixed(0) : v.toFixed(1));
const figure = (v: number, longest: number) => lifeFigure(v, longest, num);

export function CauseTable({ causes, selected, hrefFor, unit }: { causes: LifeSummary[]; selected: string | null; hrefFor: (cause: string) => string; unit: string }) {
  return (
    <div className="overflow-x-auto rounded-lg border border-line">
      <table className="w-full border-collapse text-sm" data-life-causes>
        <caption className="sr-only">Weibull fit per root cause</caption>
        <thead className="bg-surface-2 text-xs text-muted">
          <tr>
            <th scope="col" className="px-2.5 py-2 text-left font-semibold">Root cause</th>
            <th scope="col" className="px-2.5 py-2 text-right font-semibold">Failures</th>
            <th scope="col" className="whitespace-nowrap px-2.5 py-2 text-right font-semibold">β</th>
            <th scope="col" className="whitespace-nowrap px-2.5 py-2 text-right font-semibold">{`η (${unit})`}</th>
            <th scope="col" className="whitespace-nowrap px-2.5 py-2 text-right font-semibold">{`B10 (${unit})`}</th>
            <th scope="col" className="whitespace-nowrap px-2.5 py-2 text-left font-semibold">Reads as</th>
          </tr>
        </thead>
        <tbody>
          {causes.map((c) => {
            const on = c.cause === selected;
            return (
              <tr key={c.cause} className={`border-t border-line ${on ? "bg-accent-soft/60" : "hover:bg-surface-2"}`}>
                <th scope="row" className="px-2.5 py-2 text-left font-medium">
                  <Link href={hrefFor(c.cause)} aria-current={on ? "true" : undefined} scroll={false} className={`hover:text-accent ${on ? "text-accent" : "text-ink"}`}>{c.label}</Link>
                  {c.cautions.length ? <span className="mt-0.5 block text-xs font-normal text-warn" data-life-caution-tags><span aria-hidden>⚠ </span>{cautionTags(c.cautions)}</span> : null}
                </th>
                <td className="px-2.5 py-2 text-right tabular text-ink-2">{c.failures.toLocaleString("en-US")}</td>
                {c.fit ? (
                  <>
                    <td className="px-2.5 py-2 text-right tabular text-ink-2">{c.fit.beta.toFixed(2)}</td>
                    <td className="whitespace-nowrap px-2.5 py-2 text-right tabular text-ink-2">{figure(c.fit.eta, c.longestLife)}</td>
                    <td className="whitespace-nowrap px-2.5 py-2 text-right tabular text-ink-2">{figure(c.fit.b10, c.longestLife)}</td>
                    <td className="whitespace-nowrap px-2.5 py-2"><ShapeBadge reading={c.fit.shapeReading} /></td>
                  </>
                ) : (
                  <td colSpan={4} className="px-2.5 py-2 text-xs text-muted">{c.note}</td>
                )}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
