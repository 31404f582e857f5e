// What the demo plan decides for each case before the details are drawn.
import type { RootCauseCode, TriggerCode } from "../../lib/classification";
import type { Stage } from "../../lib/cases/stages";
import type { Car, BearingOptions } from "./fleet";
import type { ProcedureFault } from "./field-parts";

export type RemovalSite = "MJC" | "PYC" | "OSW";

/** The stories the demo casebook tells; each shows up in the charts and searches. */
export type Story = "pellham-hand-roll" | "water-run" | "arc-cluster" | "bad-lot" | "repeat-car" | "missed-call";

export type CaseSpec = {
  key: string;
  trigger: TriggerCode;
  /** What teardown shows (and, once proposed, the verdict's primary cause). */
  cause: RootCauseCode;
  site: RemovalSite;
  removedOn: string;
  status: Stage;
  story?: Story;
  car?: Car;
  /** The axle and side, when a story needs the same position again. */
  position?: { axle: number; side: "L" | "R" };
  bearing?: BearingOptions;
  procedureFault?: ProcedureFault;
  /** The wayside alarm was not confirmed on inspection; the car came out under the owner's rule. */
  alarmNotConfirmed?: boolean;
  /** Sent back to the bench once before it was signed (or, on the bench, waiting to go again). */
  returned?: boolean;
  /** Signed, reopened with a reason, and signed again. */
  reopened?: boolean;
};
