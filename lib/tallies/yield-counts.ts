// Raw counts the removal-yield page is shaped from. Plain JSON, produced by db/queries/tallies/yield-*.ts.

/** Signed hot-bearing alarms with a recorded outcome, per whole °F of margin and of reading. */
export type HotCell = { margin: number; reading: number; confirmed: number; n: number };

/** One group (acoustic level, trigger, detector, shop, inspector, quarter) of signed removals. */
export type OutcomeCell = {
  key: string;
  /** Signed removals with a recorded outcome. */
  n: number;
  confirmed: number;
  noDefect: number;
  /** Money on the no-defect removals, from each removal site's cost per removal. */
  costUsd: number;
  /** No-defect removals whose site has no cost per removal set. */
  uncosted: number;
};

export type DetectorCell = OutcomeCell & { trigger: string; location: string | null; alarms: number };

export type CallCell = OutcomeCell & { siteId: string | null; quarter: string | null };

export type KeepCell = { key: string; keeps: number; missed: number };

export type YieldCounts = {
  hot: HotCell[];
  /** Hot-bearing alarms signed with an outcome but no usable reading and threshold. */
  hotWithoutReading: number;
  acoustic: OutcomeCell[];
  detectors: DetectorCell[];
  triggers: OutcomeCell[];
  callsByShop: OutcomeCell[];
  callsByInspector: OutcomeCell[];
  callsByQuarter: CallCell[];
  keepsByShop: KeepCell[];
  keepsByInspector: KeepCell[];
};
