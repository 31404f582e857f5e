// Cause x site counts with the cells that stand out shaded: warm where a site has more of a cause
// than its share of verdicts would suggest, cool where it has fewer.
import { strengthWords } from "@/lib/tallies/read-outs";
import type { CauseSiteTally } from "@/lib/tallies/types";

const pWords = (p: number) => (p < 0.001 ? "p < 0.001" : `p = ${p.toFixed(3)}`);

function shade(r: number | null): string {
  if (r === null || Math.abs(r) <= 2) return "";
  if (r > 3) return "bg-danger-soft font-semibold text-danger";
  if (r > 2) return "bg-accent-soft font-semibold text-ink";
  if (r < -3) return "bg-stage-field-soft font-semibold text-stage-field";
  return "bg-stage-field-soft/60 text-ink";
}

export function CauseSiteTable({ tally }: { tally: CauseSiteTally }) {
  return (
    <div>
      <div className="max-h-[26rem] overflow-auto rounded-lg border border-line">
        <table className="w-full border-collapse text-sm">
          <caption className="sr-only">Signed verdicts by removal site and root cause</caption>
          <thead className="sticky top-0 bg-surface-2">
            <tr>
              <th scope="col" className="border-b border-line px-3 py-2 text-left text-xs font-semibold text-muted">
                Site
              </th>
              {tally.causes.map((c) => (
                <th
                  key={c.code || "none"}
                  scope="col"
                  className="whitespace-nowrap border-b border-line px-3 py-2 text-right text-xs font-semibold text-muted"
                >
                  {c.label}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {tally.sites.map((s, i) => (
              <tr key={s.id}>
                <th scope="row" className="whitespace-nowrap border-b border-line px-3 py-1.5 text-left font-medium text-ink">
                  {s.label}
                </th>
                {tally.causes.map((c, j) => {
                  const r = tally.residuals[i][j];
                  return (
                    <td
                      key={c.code || "none"}
                      className={`border-b border-line px-3 py-1.5 text-right tabular ${shade(r)}`}
                      title={r === null ? undefined : `adjusted residual ${r.toFixed(2)}`}
                    >
                      {tally.counts[i][j]}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="mt-2 flex flex-wrap gap-x-4 gap-y-1 text-xs text-muted">
        <span>
          <span className="mr-1 inline-block h-2.5 w-2.5 rounded-sm bg-accent-soft align-middle ring-1 ring-line" />
          more than expected
        </span>
        <span>
          <span className="mr-1 inline-block h-2.5 w-2.5 rounded-sm bg-danger-soft align-middle ring-1 ring-line" />
          far more
        </span>
        <span>
          <span className="mr-1 inline-block h-2.5 w-2.5 rounded-sm bg-stage-field-soft align-middle ring-1 ring-line" />
          fewer than expected
        </span>
        <span>(adjusted residual beyond ±2, strong beyond ±3)</span>
      </p>
    </div>
  );
}

/** The test in a manager's words, with the cells that stand out. */
export function CauseSiteFindings({ tally }: { tally: CauseSiteTally }) {
  const significant = tally.pValue !== null && tally.pValue < 0.05;
  const notes = tally.notes.slice(0, 6);
  const strength = strengthWords(tally.cramersV, tally.strength);
  return (
    <div className="space-y-2">
      <p className="font-medium text-ink">{tally.summary}</p>
      {strength ? <p data-cause-site-strength>{strength}</p> : null}
      {tally.statistic !== null ? (
        <p className="text-xs text-muted tabular" data-cause-site-tests>
          {`Pearson chi-square ${tally.statistic.toFixed(1)}, ${pWords(tally.pValue!)}; likelihood-ratio G ${tally.gStatistic!.toFixed(1)}, ${pWords(tally.gPValue!)}; both on ${tally.df} degrees of freedom.`}
        </p>
      ) : null}
      {notes.length ? (
        <>
          {!significant ? (
            <p className="text-xs text-muted">Taken alone these cells stand out, but with this many cells a few always do by chance:</p>
          ) : null}
          <ul className="space-y-1">
            {notes.map((n) => (
              <li key={`${n.site}-${n.cause}`} className="flex gap-2">
                <span aria-hidden className={n.residual > 0 ? "text-danger" : "text-stage-field"}>
                  {n.residual > 0 ? "▲" : "▼"}
                </span>
                <span>{n.sentence}.</span>
              </li>
            ))}
          </ul>
        </>
      ) : null}
      {tally.warnings.map((w) => (
        <p key={w} className="text-xs text-warn">
          {w}
        </p>
      ))}
    </div>
  );
}
