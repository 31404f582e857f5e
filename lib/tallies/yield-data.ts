// What the removal-yield page and its API hand out. Plain JSON.
import type { FunnelLimits, ProportionInterval } from "@/lib/stats";
import type { TallyFilters } from "./filters";
import type { RateBin } from "./yield-bins";

export type RateRow = {
  id: string;
  label: string;
  n: number;
  confirmed: number;
  noDefect: number;
  rate: ProportionInterval;
  costUsd: number;
  uncosted: number;
  small: boolean;
};

export type CurvePoint = { x: number; p: number; lower: number; upper: number };

export type ReadingFit = {
  basis: "margin" | "reading";
  n: number;
  confirmed: number;
  bins: RateBin[];
  /** null when there is nothing to fit (no spread of readings, one outcome only, or perfect separation). */
  fit: null | {
    intercept: number;
    slope: number;
    slopeWald: [number, number];
    slopeProfile: [number, number];
    /** Likelihood-ratio test that confirmation depends on the reading: p-value, 1 df. */
    pValue: number;
    curve: CurvePoint[];
    /** Reading at which half and at which 80% of removals are expected to be confirmed, with Fieller 95% interval (null = unbounded). */
    at50: { x: number; lower: number | null; upper: number | null } | null;
    at80: { x: number; lower: number | null; upper: number | null } | null;
  };
  /** Why no fit is shown. */
  noFit: string | null;
  /** Confirmed share above and below a split reading, for the summary sentence. */
  split: null | { at: number; above: ProportionInterval & { n: number }; below: ProportionInterval & { n: number } };
};

export type DetectorRow = RateRow & {
  trigger: string;
  location: string;
  alarms: number;
  position: "below-998" | "below-95" | "inside" | "above-95" | "above-998" | null;
};

export type CallRow = RateRow & { keeps: number; missed: number };

export type QuarterSeries = { id: string; label: string; points: { quarter: string; n: number; confirmed: number; p: number | null }[] };

export type YieldData = {
  filters: TallyFilters;
  missWindow: number;
  siteLimit: { code: string; name: string } | null;
  /** An inspector sees only their own calls. */
  ownCallsOnly: boolean;
  /** Whether names are shown (managers and admins); otherwise inspectors appear as "Inspector 1"… */
  namesShown: boolean;
  generatedAt: string;
  summary: string[];
  cautions: string[];
  hot: { margin: ReadingFit; reading: ReadingFit; withoutReading: number };
  acoustic: RateRow[];
  detectors: { fleet: ProportionInterval & { n: number; confirmed: number }; rows: DetectorRow[]; funnel: FunnelLimits[] };
  calls: {
    shops: CallRow[];
    inspectors: CallRow[];
    quarters: QuarterSeries[];
    quarterList: string[];
    overall: ProportionInterval & { n: number };
  };
  cost: { byTrigger: RateRow[]; byDetector: DetectorRow[]; totalUsd: number; uncosted: number; noDefect: number };
};
