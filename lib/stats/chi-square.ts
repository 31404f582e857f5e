import { chiSquareSurvival } from "./distributions";

export interface ChiSquareOptions {
  /** Yates' continuity correction; applies to 2x2 tables only. */
  yatesCorrection?: boolean;
}

export interface ChiSquareResult {
  /** Pearson statistic; null when fewer than two non-empty rows or columns remain. */
  statistic: number | null;
  df: number;
  pValue: number | null;
  /** Original indices of the rows and columns kept (all-zero ones are dropped). */
  rowIndices: number[];
  colIndices: number[];
  observed: number[][];
  expected: number[][];
  /** Haberman's adjusted residuals (O-E)/sqrt(E(1-row/N)(1-col/N)); roughly N(0,1) under independence. */
  adjustedResiduals: number[][];
  /** Share of cells with an expected count below 5. */
  lowExpectedShare: number;
  warnings: string[];
  yatesApplied: boolean;
}

const sum = (xs: number[]) => xs.reduce((s, v) => s + v, 0);

/** Pearson chi-square test of independence on an r x c table of counts. */
export function chiSquareTest(table: readonly (readonly number[])[], opts: ChiSquareOptions = {}): ChiSquareResult {
  const cols = table[0]?.length ?? 0;
  for (const row of table) {
    if (row.length !== cols) throw new RangeError("All rows of the table must have the same length.");
    for (const v of row) if (!(Number.isFinite(v) && v >= 0)) throw new RangeError("Counts must be non-negative numbers.");
  }
  const rowIndices = table.map((row, i) => (sum([...row]) > 0 ? i : -1)).filter((i) => i >= 0);
  const colIndices = [...Array(cols).keys()].filter((j) => table.some((row) => row[j] > 0));
  const observed = rowIndices.map((i) => colIndices.map((j) => table[i][j]));
  const rowTotals = observed.map(sum);
  const colTotals = colIndices.map((_, j) => sum(observed.map((row) => row[j])));
  const total = sum(rowTotals);
  const expected = observed.map((row, i) => row.map((_, j) => (rowTotals[i] * colTotals[j]) / total));
  const warnings: string[] = [];
  const base = { rowIndices, colIndices, observed, expected, warnings };

  if (rowIndices.length < 2 || colIndices.length < 2) {
    warnings.push("A test of independence needs at least two non-empty rows and two non-empty columns.");
    const zeros = observed.map((row) => row.map(() => 0));
    return { ...base, statistic: null, df: 0, pValue: null, adjustedResiduals: zeros, lowExpectedShare: 0, yatesApplied: false };
  }

  const yatesApplied = opts.yatesCorrection === true && rowIndices.length === 2 && colIndices.length === 2;
  let statistic = 0;
  let lowCells = 0;
  const adjustedResiduals = observed.map((row, i) =>
    row.map((o, j) => {
      const e = expected[i][j];
      if (e < 5) lowCells++;
      // Yates: shrink |O-E| by 0.5, never past zero
      const diff = yatesApplied ? Math.max(0, Math.abs(o - e) - 0.5) : o - e;
      statistic += (diff * diff) / e;
      return (o - e) / Math.sqrt(e * (1 - rowTotals[i] / total) * (1 - colTotals[j] / total));
    }),
  );
  const cells = rowIndices.length * colIndices.length;
  const lowExpectedShare = lowCells / cells;
  if (lowExpectedShare > 0.2) {
    warnings.push(
      `${lowCells} of ${cells} cells (${Math.round(lowExpectedShare * 100)}%) expect fewer than 5 cases; ` +
        "when more than a fifth of the cells expect fewer than 5, the p-value is not to be trusted " +
        "(the usual rule of thumb, Cochran's rule). Combine categories or gather more data.",
    );
  }
  const df = (rowIndices.length - 1) * (colIndices.length - 1);
  return { ...base, statistic, df, pValue: chiSquareSurvival(statistic, df), adjustedResiduals, lowExpectedShare, yatesApplied };
}
