// The chosen cause's parameters with both kinds of 95% bounds and the rank-regression check.
import type { LifeDetail } from "@/lib/tallies/life";
import { LR_LIMIT } from "@/lib/tallies/life-data";

const num = (v: number | undefined | null) => (v === undefined || v === null || !Number.isFinite(v) ? "–" : v >= 1000 ? Math.round(v).toLocaleString("en-US") : v >= 100 ? v.toFixed(0) : v >= 10 ? v.toFixed(1) : v.toFixed(2));
const range = (b?: [number, number] | null) => (b ? `${num(b[0])} – ${num(b[1])}` : "–");

export function ParameterTable({ detail, unit }: { detail: LifeDetail; unit: string }) {
  const m = detail.mle;
  const lr = detail.likelihoodRatio;
  const rr = detail.rankRegression;
  const rows = [
    { name: "Shape β", mle: m?.beta, fisher: m?.fisher.beta, lr: lr?.beta, rr: rr?.beta },
    { name: `Scale η (${unit})`, mle: m?.eta, fisher: m?.fisher.eta, lr: lr?.eta, rr: rr?.eta },
    { name: `B10 life (${unit})`, mle: m?.b10, fisher: m?.fisher.b10, lr: lr?.b10, rr: rr?.b10 },
  ];
  return (
    <div className="overflow-x-auto rounded-lg border border-line">
      <table className="w-full border-collapse text-sm" data-life-parameters>
        <caption className="sr-only">Weibull parameters with 95% bounds</caption>
        <thead className="bg-surface-2 text-xs text-muted">
          <tr>
            <th scope="col" className="px-3 py-2 text-left font-semibold">Parameter</th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">Max. likelihood</th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">95% Fisher</th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">95% likelihood ratio</th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">Rank regression</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.name} className="border-t border-line">
              <th scope="row" className="whitespace-nowrap px-3 py-2 text-left font-medium text-ink">{r.name}</th>
              <td className="px-3 py-2 text-right font-semibold tabular text-ink">{num(r.mle)}</td>
              <td className="whitespace-nowrap px-3 py-2 text-right tabular text-ink-2">{range(r.fisher)}</td>
              <td className="whitespace-nowrap px-3 py-2 text-right tabular text-ink-2">{lr ? range(r.lr) : <span className="text-xs text-muted">large data set</span>}</td>
              <td className="px-3 py-2 text-right tabular text-ink-2">{num(r.rr)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="border-t border-line px-3 py-2 text-xs text-muted">
        {rr ? `Rank regression (median ranks, Johnson's adjustment for suspensions, x on y): r² = ${rr.r2.toFixed(3)}. ` : ""}
        {lr ? "" : `Likelihood-ratio bounds are worked out for up to ${LR_LIMIT.toLocaleString("en-US")} units; narrow the filters to see them.`}
      </p>
    </div>
  );
}
