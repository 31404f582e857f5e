// The field report for a planned case: checks that fit the trigger, the trigger detail, the notes.
import type { FieldChecks } from "../../lib/cases/schemas";
import type { RootCauseCode } from "../../lib/classification";
import type { CaseSpec } from "./case-spec";
import { endPlayTrials, handRollGrid, procedure, tightEndPlay, type EndPlayStyle } from "./field-parts";
import { fieldNoteFor, triggerDetailFor, visualFor } from "./field-words";
import type { Rng } from "./prng";

/** How likely a damaged bearing also felt rough when turned by hand, by what damaged it (common practice, estimated). */
const ROUGH_ODDS: Partial<Record<RootCauseCode, number>> = {
  "end-of-life": 0.55,
  "debris-ingress": 0.45,
  lubrication: 0.5,
  material: 0.5,
  "water-ingress": 0.35,
  impact: 0.4,
  electrical: 0.3,
  reconditioning: 0.3,
  undetermined: 0.2,
};

/** End play grows as a bearing wears (common practice): worn causes read higher, still inside the limit. */
function normalEndPlayIn(rng: Rng, cause: RootCauseCode): number {
  const worn = cause === "end-of-life" || (cause === "debris-ingress" && rng.chance(0.5));
  return worn ? rng.real(0.034, 0.055) : rng.real(0.008, 0.028);
}

function endPlayStyle(rng: Rng, spec: CaseSpec): EndPlayStyle {
  if (spec.site === "OSW") return rng.chance(0.7) ? "dial-mm" : "dial-in";
  return rng.weighted([
    ["dial-in", spec.site === "PYC" ? 70 : 85],
    ["tape", spec.site === "PYC" ? 30 : 15],
  ]);
}

export type FieldReport = { fieldChecks: FieldChecks; triggerDetail: Record<string, string | number | boolean | null>; fieldNotes: string };

export function buildFieldReport(rng: Rng, spec: CaseSpec, draft = false): FieldReport {
  const { trigger, cause } = spec;
  const defective = cause !== "no-defect";

  let grid;
  let felt: "roughness" | "catch" | "both" | undefined;
  if (trigger === "hand-roll") {
    felt = rng.weighted([
      ["roughness", 55],
      ["catch", 30],
      ["both", 15],
    ] as const);
    const feel = felt === "roughness" ? "rough" : felt;
    grid = handRollGrid(rng, {
      rough:
        felt === "both"
          ? 2
          : rng.weighted([
              [1, 60],
              [2, 30],
              [3, 10],
            ]),
      feel,
      stiff: cause === "no-defect" ? rng.int(0, 2) : 0,
    });
  } else if (trigger === "end-play-tight") {
    grid = handRollGrid(rng, { stiff: 6 });
  } else {
    const rough = defective && rng.chance(ROUGH_ODDS[cause] ?? 0.15) ? rng.int(1, 2) : 0;
    grid = handRollGrid(rng, {
      rough,
      stiff: rough
        ? 0
        : rng.weighted([
            [0, 80],
            [1, 15],
            [2, 5],
          ]),
    });
  }
  if (draft && trigger !== "hand-roll" && rng.chance(0.5)) grid = handRollGrid(rng, { checkedPositions: 1 });

  const checks: FieldChecks = {
    handRoll: { grid, procedure: procedure(spec.procedureFault) },
    visual: visualFor(rng, spec),
    confirmations: { ppe: true, blueSignal: true, wheelsetSecured: true, ...(trigger === "wayside-hot" ? { cooled: true } : {}) },
  };
  if (draft && rng.chance(0.4)) checks.confirmations = { ppe: true };

  const measured = trigger === "end-play-high" || trigger === "end-play-tight" || !(draft ? rng.chance(0.5) : rng.chance(0.12));
  if (trigger === "end-play-tight") checks.endPlay = tightEndPlay(rng);
  else if (trigger === "end-play-high") checks.endPlay = endPlayTrials(rng, rng.real(0.066, 0.092), endPlayStyle(rng, spec));
  else if (measured) checks.endPlay = endPlayTrials(rng, normalEndPlayIn(rng, cause), endPlayStyle(rng, spec));

  if (trigger === "wayside-hot" || trigger === "wayside-acoustic") checks.waysideAlarmConfirmed = !spec.alarmNotConfirmed;

  return {
    fieldChecks: checks,
    triggerDetail: triggerDetailFor(rng, spec, { felt, endPlay: checks.endPlay }),
    fieldNotes: fieldNoteFor(rng, spec),
  };
}
