// Cause x site: Pearson chi-square test of independence, the likelihood-ratio G test and
// Cramér's V beside it (how strong, not only whether), and the cells that stand out, in words.
import { association, chiSquareTest, describeResiduals } from "@/lib/stats";
import { causeLabel } from "./labels";
import { sumBy } from "./shape-verdicts";
import type { CauseSiteTally, VerdictCell } from "./types";

export { strengthWords } from "./read-outs";

export function causeSiteTally(cells: readonly VerdictCell[], siteLabel: (id: string) => string, threshold = 2): CauseSiteTally {
  const withSite = cells.filter((c) => c.siteId !== null);
  const siteTotals = [...sumBy(withSite, (c) => c.siteId as string)].map(([id, l]) => ({ id, n: l.reduce((s, c) => s + c.count, 0) }));
  const causeTotals = [...sumBy(withSite, (c) => c.cause ?? "")].map(([code, l]) => ({ code, n: l.reduce((s, c) => s + c.count, 0) }));
  siteTotals.sort((a, b) => b.n - a.n || siteLabel(a.id).localeCompare(siteLabel(b.id)));
  causeTotals.sort((a, b) => b.n - a.n || a.code.localeCompare(b.code));

  const sites = siteTotals.map((s) => ({ id: s.id, label: siteLabel(s.id) }));
  const causes = causeTotals.map((c) => ({ code: c.code, label: causeLabel(c.code || null) }));
  const counts = sites.map(() => causes.map(() => 0));
  const si = new Map(sites.map((s, i) => [s.id, i]));
  const ci = new Map(causes.map((c, i) => [c.code, i]));
  for (const c of withSite) counts[si.get(c.siteId as string)!][ci.get(c.cause ?? "")!] += c.count;

  const residuals: (number | null)[][] = sites.map(() => causes.map(() => null));
  if (sites.length === 0 || causes.length === 0) {
    return {
      sites,
      causes,
      counts,
      residuals,
      statistic: null,
      df: 0,
      pValue: null,
      gStatistic: null,
      gPValue: null,
      cramersV: null,
      strength: null,
      warnings: [],
      notes: [],
      summary: "No signed verdicts to compare.",
    };
  }
  const test = chiSquareTest(counts);
  test.adjustedResiduals.forEach((row, i) => row.forEach((r, j) => (residuals[test.rowIndices[i]][test.colIndices[j]] = r)));
  const notes = describeResiduals(
    test,
    sites.map((s) => s.label),
    causes.map((c) => c.label.toLowerCase()),
    { threshold },
  ).map((d) => ({
    site: d.row,
    cause: d.col,
    observed: d.observed,
    expected: d.expected,
    residual: d.adjustedResidual,
    sentence: d.sentence,
  }));
  const strength = association(test);
  return {
    sites,
    causes,
    counts,
    residuals,
    statistic: test.statistic,
    df: test.df,
    pValue: test.pValue,
    ...strength,
    warnings: test.warnings,
    notes,
    summary: plainSummary(test.pValue, sites.length),
  };
}

/** What the p-value means for a manager, without the jargon. */
export function plainSummary(pValue: number | null, siteCount: number): string {
  if (pValue === null) {
    return siteCount < 2
      ? "Only one site in view: choose a wider filter to compare sites."
      : "Too few verdicts to compare the sites' mixes of causes.";
  }
  if (pValue < 0.001) return "The sites' mixes of causes clearly differ (a difference this large would almost never arise by chance).";
  if (pValue < 0.05) return "The sites' mixes of causes differ more than chance alone would usually explain.";
  return "The sites' mixes of causes look alike: the differences are within what chance alone produces.";
}
