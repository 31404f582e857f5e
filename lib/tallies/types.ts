// Shapes that travel from the count queries through the shaping functions to the charts.
// Everything here is plain JSON (dates as strings) so pages and the API can pass it on as is.
import type { ParetoRow, ProportionInterval } from "@/lib/stats";
import type { SectorCell } from "@/lib/damage-map/rings";
import type { ClusterKey, TallyFilters } from "./filters";

export type Outcome = "confirmed" | "no-defect" | null;

/** One GROUP BY cell of signed verdicts. */
export type VerdictCell = { siteId: string | null; trigger: string; cause: string | null; outcome: Outcome; count: number };

/** One GROUP BY cell of removals per month; `cause` is set only for signed verdicts. */
export type MonthCell = { month: string; signed: boolean; cause: string | null; count: number };

export type SiteInfo = { id: string; code: string; name: string; kind: string };

export type ParetoBar = ParetoRow & { code: string };

export type TriggerVerdictRow = {
  trigger: string;
  label: string;
  confirmed: number;
  noDefect: number;
  notRecorded: number;
  total: number;
  /** Share confirmed among teardowns that recorded an outcome, with the Wilson interval. */
  rate: ProportionInterval;
};

export type ConfirmationRow = {
  id: string;
  label: string;
  confirmed: number;
  /** Teardowns that recorded an outcome (confirmed + no defect). */
  n: number;
  rate: ProportionInterval;
  /** The whole interval lies below the overall rate: this group's calls are confirmed less often. */
  standsOut: "below" | "above" | null;
};

export type ConfirmationTable = { overall: ProportionInterval & { confirmed: number; n: number }; rows: ConfirmationRow[] };

export type ControlSeries = {
  id: string;
  label: string;
  counts: number[];
  centre: number;
  upperLimit: number;
  lowerLimit: number;
  beyond: ("above" | "below" | null)[];
};

export type MonthlyTally = {
  months: string[];
  series: ControlSeries[];
  /** The current month, not yet complete: shown, not judged. */ partialMonth: string | null;
};

export type ResidualNote = { site: string; cause: string; observed: number; expected: number; residual: number; sentence: string };

export type CauseSiteTally = {
  sites: { id: string; label: string }[];
  causes: { code: string; label: string }[];
  /** counts[site][cause] */
  counts: number[][];
  /** Adjusted residuals on the same grid; null where a row or column was empty. */
  residuals: (number | null)[][];
  statistic: number | null;
  df: number;
  pValue: number | null;
  /** Likelihood-ratio G statistic on the same degrees of freedom, and its p-value. */
  gStatistic: number | null;
  gPValue: number | null;
  /** Cramér's V, 0 to 1: how strongly site and cause go together. */
  cramersV: number | null;
  strength: "negligible" | "weak" | "moderate" | "strong" | null;
  warnings: string[];
  notes: ResidualNote[];
  summary: string;
};

export type ClusterItem = {
  key: string;
  keyLabel: string;
  cause: string;
  causeLabel: string;
  firstDate: string;
  lastDate: string;
  size: number;
  caseNumbers: string[];
};

export type ClusterTally = { keyKind: ClusterKey; windowDays: number; minSize: number; total: number; items: ClusterItem[] };

/** Findings on the cup and cone raceways with a clock position, summed into clock sectors. */
export type DamageTally = { sectorDeg: number; sectors: SectorCell[]; placed: number };

export type Totals = { removals: number; signed: number; confirmed: number; noDefect: number; outcomeNotRecorded: number };

export type TalliesData = {
  filters: TallyFilters;
  /** Set when the viewer may only see one site's removals. */
  siteLimit: { code: string; name: string } | null;
  generatedAt: string;
  totals: Totals;
  pareto: ParetoBar[];
  triggerVerdict: TriggerVerdictRow[];
  byTrigger: ConfirmationTable;
  byShop: ConfirmationTable;
  monthly: MonthlyTally;
  causeSite: CauseSiteTally;
  clusters: ClusterTally;
  damage: DamageTally;
};
