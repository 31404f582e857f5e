// The demo casebook as groups of like cases: trigger, what teardown finds, where and when.
// Counts are chosen so the charts tell the stories listed in case-spec.ts.
import type { RootCauseCode, TriggerCode } from "../../lib/classification";
import type { RemovalSite, Story } from "./case-spec";
import type { Car, BearingOptions } from "./fleet";
import type { ProcedureFault } from "./field-parts";

export type Group = {
  n: number;
  trigger: TriggerCode;
  cause: RootCauseCode;
  site?: RemovalSite;
  window?: readonly [string, string];
  story?: Story;
  bearing?: BearingOptions;
  /** Procedure faults given to the first members (a check done the wrong way). */
  faults?: readonly ProcedureFault[];
  /** How many members had the wayside alarm not confirmed on inspection. */
  unconfirmed?: number;
  /** Cars given to the first members: the same car coming back. */
  cars?: readonly Car[];
};

export const HISTORY_WINDOW = ["2024-12-01", "2026-09-30"] as const;
export const RECENT_WINDOW = ["2026-10-01", "2026-11-29"] as const;
export const WATER_RUN = ["2025-03-24", "2025-06-13"] as const;
export const ARC_WEEKS = ["2026-02-09", "2026-03-06"] as const;
const LOT_FAILURES = ["2025-04-01", "2026-05-31"] as const;
const LOT_WITHDRAWAL = ["2026-06-15", "2026-09-20"] as const;

export const BAD_LOT: BearingOptions = { maker: "MK-C", lot: "C-2207", manufacturedYm: "2022-07", timesReconditioned: 0 };
export const REPEAT_CARS = {
  three: { mark: "QVRX", number: "407120" },
  two: { mark: "KMLX", number: "21907" },
  wheels: { mark: "TNBX", number: "8830" },
} as const;

const water = { cause: "water-ingress", story: "water-run", window: WATER_RUN } as const;
const lot = { cause: "material", story: "bad-lot", bearing: BAD_LOT, window: LOT_FAILURES } as const;

export const HISTORY_GROUPS: readonly Group[] = [
  // Wayside hot-bearing alarms: about 40% show no defect at teardown.
  { n: 8, trigger: "wayside-hot", cause: "no-defect", unconfirmed: 3 },
  { n: 3, trigger: "wayside-hot", cause: "end-of-life", cars: [REPEAT_CARS.two] },
  { n: 3, trigger: "wayside-hot", cause: "lubrication", cars: [REPEAT_CARS.three] },
  { n: 2, trigger: "wayside-hot", ...water },
  { n: 1, trigger: "wayside-hot", cause: "seal" },
  { n: 1, trigger: "wayside-hot", cause: "debris-ingress" },
  { n: 1, trigger: "wayside-hot", ...lot },
  { n: 1, trigger: "wayside-hot", cause: "undetermined" },
  // Hand roll at Pellham Yard: many removals teardown did not confirm, several from faulty checks.
  { n: 9, trigger: "hand-roll", cause: "no-defect", site: "PYC", story: "pellham-hand-roll", faults: ["oscillated", "ear", "oscillated"] },
  { n: 2, trigger: "hand-roll", cause: "end-of-life", site: "PYC" },
  { n: 1, trigger: "hand-roll", site: "PYC", ...water },
  { n: 1, trigger: "hand-roll", cause: "water-ingress", site: "PYC" },
  { n: 2, trigger: "hand-roll", cause: "debris-ingress", site: "PYC" },
  { n: 1, trigger: "hand-roll", cause: "reconditioning", site: "PYC" },
  // Hand roll at Marrow Junction and Osier: mostly confirmed.
  { n: 1, trigger: "hand-roll", cause: "no-defect", site: "MJC" },
  { n: 3, trigger: "hand-roll", cause: "end-of-life", site: "MJC" },
  { n: 3, trigger: "hand-roll", cause: "debris-ingress", site: "MJC", cars: [REPEAT_CARS.three] },
  { n: 1, trigger: "hand-roll", site: "MJC", ...water },
  { n: 2, trigger: "hand-roll", cause: "lubrication", site: "MJC" },
  { n: 1, trigger: "hand-roll", site: "MJC", ...lot },
  { n: 1, trigger: "hand-roll", cause: "handling", site: "MJC" },
  { n: 1, trigger: "hand-roll", cause: "no-defect", site: "OSW" },
  { n: 2, trigger: "hand-roll", cause: "end-of-life", site: "OSW" },
  { n: 1, trigger: "hand-roll", cause: "debris-ingress", site: "OSW" },
  // End play.
  { n: 5, trigger: "end-play-high", cause: "end-of-life", cars: [REPEAT_CARS.two] },
  { n: 2, trigger: "end-play-high", cause: "debris-ingress" },
  { n: 1, trigger: "end-play-high", cause: "reconditioning" },
  { n: 1, trigger: "end-play-high", cause: "mounting" },
  { n: 1, trigger: "end-play-high", cause: "no-defect" },
  { n: 1, trigger: "end-play-tight", cause: "lubrication" },
  { n: 1, trigger: "end-play-tight", cause: "mounting" },
  { n: 1, trigger: "end-play-tight", cause: "reconditioning" },
  { n: 1, trigger: "end-play-tight", cause: "material" },
  // Seals and grease.
  { n: 5, trigger: "seal-grease", cause: "seal", cars: [REPEAT_CARS.three] },
  { n: 2, trigger: "seal-grease", ...water },
  { n: 1, trigger: "seal-grease", cause: "lubrication" },
  { n: 1, trigger: "seal-grease", cause: "no-defect" },
  // Welding: a cluster of arc burns at Marrow Junction after body welding on track 4.
  { n: 5, trigger: "welding", cause: "electrical", site: "MJC", story: "arc-cluster", window: ARC_WEEKS },
  { n: 1, trigger: "welding", cause: "electrical", site: "PYC" },
  { n: 1, trigger: "welding", cause: "no-defect" },
  // Fastenings.
  { n: 4, trigger: "cap-screws", cause: "mounting" },
  { n: 1, trigger: "cap-screws", cause: "reconditioning" },
  { n: 3, trigger: "backing-ring", cause: "mounting" },
  { n: 1, trigger: "backing-ring", cause: "reconditioning" },
  // Wheelsets, accidents, what was seen, programs.
  { n: 4, trigger: "wheel-removal", cause: "no-defect" },
  { n: 3, trigger: "wheel-removal", cause: "impact", cars: [REPEAT_CARS.wheels] },
  { n: 1, trigger: "wheel-removal", cause: "end-of-life" },
  { n: 1, trigger: "wheel-removal", cause: "handling" },
  { n: 1, trigger: "wheel-removal", cause: "undetermined" },
  { n: 3, trigger: "accident", cause: "impact", cars: [REPEAT_CARS.wheels] },
  { n: 1, trigger: "accident", cause: "undetermined" },
  { n: 2, trigger: "visual-other", ...water },
  { n: 1, trigger: "visual-other", cause: "lubrication" },
  { n: 1, trigger: "visual-other", ...lot },
  { n: 1, trigger: "visual-other", cause: "seal" },
  { n: 1, trigger: "visual-other", cause: "undetermined" },
  { n: 2, trigger: "scheduled", cause: "no-defect" },
  { n: 2, trigger: "scheduled", cause: "end-of-life" },
  { n: 1, trigger: "scheduled", cause: "handling" },
  { n: 1, trigger: "scheduled", ...lot, window: LOT_WITHDRAWAL },
  { n: 2, trigger: "wayside-acoustic", cause: "end-of-life" },
  { n: 1, trigger: "wayside-acoustic", ...lot },
  { n: 1, trigger: "wayside-acoustic", cause: "debris-ingress" },
  { n: 1, trigger: "wayside-acoustic", cause: "electrical" },
  { n: 1, trigger: "wayside-acoustic", cause: "no-defect" },
  { n: 1, trigger: "wayside-acoustic", cause: "water-ingress" },
  { n: 1, trigger: "other", cause: "undetermined" },
  { n: 1, trigger: "other", cause: "handling" },
  { n: 1, trigger: "other", cause: "no-defect" },
];

/** The last two months: the newest removals, still on their way through the lab. */
export const RECENT_GROUPS: readonly Group[] = [
  { n: 1, trigger: "wayside-hot", cause: "no-defect" },
  { n: 1, trigger: "wayside-hot", cause: "end-of-life" },
  { n: 1, trigger: "wayside-hot", cause: "lubrication" },
  { n: 2, trigger: "hand-roll", cause: "no-defect", site: "PYC", story: "pellham-hand-roll" },
  { n: 1, trigger: "hand-roll", cause: "end-of-life", site: "MJC" },
  { n: 1, trigger: "hand-roll", cause: "debris-ingress", site: "OSW" },
  { n: 1, trigger: "hand-roll", cause: "water-ingress", site: "PYC" },
  { n: 1, trigger: "end-play-high", cause: "end-of-life" },
  { n: 1, trigger: "end-play-high", cause: "reconditioning" },
  { n: 1, trigger: "seal-grease", cause: "seal" },
  { n: 1, trigger: "seal-grease", cause: "water-ingress" },
  { n: 1, trigger: "cap-screws", cause: "mounting" },
  { n: 1, trigger: "wheel-removal", cause: "no-defect" },
  { n: 1, trigger: "wheel-removal", cause: "impact" },
  { n: 1, trigger: "accident", cause: "impact" },
  { n: 1, trigger: "visual-other", cause: "lubrication" },
  { n: 1, trigger: "scheduled", cause: "no-defect" },
  { n: 1, trigger: "wayside-acoustic", cause: "end-of-life" },
  { n: 1, trigger: "wayside-acoustic", cause: "debris-ingress" },
  { n: 1, trigger: "other", cause: "undetermined" },
  { n: 1, trigger: "end-play-tight", cause: "mounting" },
  { n: 1, trigger: "backing-ring", cause: "mounting" },
  { n: 1, trigger: "welding", cause: "electrical", site: "PYC" },
];
