// The chosen cause's parameters with both kinds of 95% bounds and the rank-regression check.
import type { LifeDetail } from "@/lib/tallies/life";
import { lifeFigure } from "@/lib/tallies/life-cautions";
import { LR_LIMIT } from "@/lib/tallies/life-data";

const num = (v: number | undefined | null) =>
  v === undefined || v === null || !Number.isFinite(v)
    ? "–"
    : v >= 1000
      ? Math.round(v).toLocaleString("en-US")
      : v >= 100
        ? v.toFixed(0)
        : v >= 10
          ? v.toFixed(1)
          : v.toFixed(2);

export function ParameterTable({ detail, unit }: { detail: LifeDetail; unit: string }) {
  // scale and life figures far past the longest observed life print as words (the shape is not a life)
  const life = (v: number | undefined | null) =>
    v === undefined || v === null || !Number.isFinite(v) ? "–" : lifeFigure(v, detail.longestLife, (x) => num(x));
  const range = (b: [number, number] | null | undefined, f: (v: number) => string) => (b ? `${f(b[0])} – ${f(b[1])}` : "–");
  const m = detail.mle;
  const lr = detail.likelihoodRatio;
  const rr = detail.rankRegression;
  const rows = [
    { name: "Shape β", mle: m?.beta, fisher: m?.fisher.beta, lr: lr?.beta, rr: rr?.beta, f: num },
    { name: `Scale η (${unit})`, mle: m?.eta, fisher: m?.fisher.eta, lr: lr?.eta, rr: rr?.eta, f: life },
    { name: `B10 life (${unit})`, mle: m?.b10, fisher: m?.fisher.b10, lr: lr?.b10, rr: rr?.b10, f: life },
  ];
  return (
    <div
      className="overflow-x-auto rounded-lg border border-line"
      tabIndex={0}
      role="region"
      aria-label="Weibull parameters with 95% bounds"
    >
      <table className="w-full border-collapse text-sm" data-life-parameters>
        <caption className="sr-only">Weibull parameters with 95% bounds</caption>
        <thead className="bg-surface-2 text-xs text-muted">
          <tr>
            <th scope="col" className="px-3 py-2 text-left font-semibold">
              Parameter
            </th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Max. likelihood
            </th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              95% Fisher
            </th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              95% likelihood ratio
            </th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Rank regression
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.name} className="border-t border-line">
              <th scope="row" className="whitespace-nowrap px-3 py-2 text-left font-medium text-ink">
                {r.name}
              </th>
              <td className="whitespace-nowrap px-3 py-2 text-right font-semibold tabular text-ink">{r.f(r.mle)}</td>
              <td className="whitespace-nowrap px-3 py-2 text-right tabular text-ink-2">{range(r.fisher, r.f)}</td>
              <td className="whitespace-nowrap px-3 py-2 text-right tabular text-ink-2">
                {lr ? range(r.lr, r.f) : <span className="text-xs text-muted">large data set</span>}
              </td>
              <td className="whitespace-nowrap px-3 py-2 text-right tabular text-ink-2">{r.f(r.rr)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="border-t border-line px-3 py-2 text-xs text-muted">
        {rr ? `Rank regression (median ranks, Johnson's adjustment for suspensions, x on y): r² = ${rr.r2.toFixed(3)}. ` : ""}
        {`The shape is read from the 95% Fisher bounds. "Over" marks a figure more than ten times the longest life observed (${num(detail.longestLife)} ${unit}). `}
        {lr
          ? ""
          : `Likelihood-ratio bounds are worked out for up to ${LR_LIMIT.toLocaleString("en-US")} units; narrow the filters to see them.`}
      </p>
    </div>
  );
}
