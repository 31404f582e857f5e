import type { ChiSquareResult } from "./chi-square";

export interface ResidualDescriptionOptions {
  /** Cells with |adjusted residual| above this are described; default 2. */
  threshold?: number;
  /** What the counts are, plural; default "removals". */
  itemNoun?: string;
}

export interface ResidualSentence {
  row: string;
  col: string;
  observed: number;
  expected: number;
  adjustedResidual: number;
  sentence: string;
}

/**
 * Plain-English sentences for the cells that stand out, strongest first, e.g.
 * "Shop X has more water-ingress removals than expected (12 seen, 5.1 expected)".
 * Labels are given for the original table; dropped rows and columns are skipped.
 */
export function describeResiduals(
  result: ChiSquareResult,
  rowLabels: readonly string[],
  colLabels: readonly string[],
  opts: ResidualDescriptionOptions = {},
): ResidualSentence[] {
  const threshold = opts.threshold ?? 2;
  const noun = opts.itemNoun ?? "removals";
  const out: ResidualSentence[] = [];
  result.adjustedResiduals.forEach((row, i) =>
    row.forEach((residual, j) => {
      if (!(Math.abs(residual) > threshold)) return;
      const rowLabel = rowLabels[result.rowIndices[i]] ?? `Row ${result.rowIndices[i] + 1}`;
      const colLabel = colLabels[result.colIndices[j]] ?? `column ${result.colIndices[j] + 1}`;
      const observed = result.observed[i][j];
      const expected = result.expected[i][j];
      const moreOrFewer = residual > 0 ? "more" : "fewer";
      out.push({
        row: rowLabel,
        col: colLabel,
        observed,
        expected,
        adjustedResidual: residual,
        sentence: `${rowLabel} has ${moreOrFewer} ${colLabel} ${noun} than expected (${observed} seen, ${expected.toFixed(1)} expected)`,
      });
    }),
  );
  return out.sort((a, b) => Math.abs(b.adjustedResidual) - Math.abs(a.adjustedResidual));
}
