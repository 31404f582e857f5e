// How strongly two classifications go together, beside the chi-square test's "whether":
// the likelihood-ratio G statistic (same degrees of freedom as Pearson's) and Cramér's V.
import type { ChiSquareResult } from "./chi-square";
import { chiSquareSurvival } from "./distributions";

export interface Association {
  /** G = 2 Σ O ln(O/E) over non-empty cells; null when the table cannot be tested. */
  gStatistic: number | null;
  gPValue: number | null;
  /** Cramér's V = sqrt(χ² / (N (min(r, c) − 1))), 0 (none) to 1 (complete); from Pearson's χ². */
  cramersV: number | null;
  /** V in words, by the usual rule-of-thumb bands. */
  strength: "negligible" | "weak" | "moderate" | "strong" | null;
}

/** G and Cramér's V from an (uncorrected) chi-square result on the same table. */
export function association(test: ChiSquareResult): Association {
  if (test.statistic === null || test.df === 0) return { gStatistic: null, gPValue: null, cramersV: null, strength: null };
  let g = 0;
  let n = 0;
  test.observed.forEach((row, i) =>
    row.forEach((o, j) => {
      n += o;
      if (o > 0) g += o * Math.log(o / test.expected[i][j]); // 0·ln 0 is taken as 0
    }),
  );
  g *= 2;
  const k = Math.min(test.observed.length, test.observed[0].length) - 1;
  // Pearson's statistic without Yates' correction is what V is defined on
  const chi2 = test.yatesApplied ? pearsonUncorrected(test) : test.statistic;
  const v = Math.sqrt(chi2 / (n * k));
  return { gStatistic: g, gPValue: chiSquareSurvival(g, test.df), cramersV: v, strength: strengthOf(v) };
}

function pearsonUncorrected(test: ChiSquareResult): number {
  let s = 0;
  test.observed.forEach((row, i) => row.forEach((o, j) => (s += (o - test.expected[i][j]) ** 2 / test.expected[i][j])));
  return s;
}

/** Bands commonly used for V (common practice, after Cohen 1988 for one degree of freedom). */
export function strengthOf(v: number): Association["strength"] {
  if (v < 0.1) return "negligible";
  if (v < 0.3) return "weak";
  if (v < 0.5) return "moderate";
  return "strong";
}
