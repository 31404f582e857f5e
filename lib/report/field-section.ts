// The shop checks as the report shows them: recomputed from the recorded readings with lib/field,
// so the arithmetic on paper is the arithmetic the product applies (trial values, mean, spread, call).
import {
  AXLE_POSITIONS,
  decideFieldCall,
  DEFAULT_END_PLAY_POLICY,
  evaluateEndPlay,
  evaluateHandRoll,
  formatInches,
  formatMm,
  inToMm,
  nearestSixtyFourth,
  visualFindingDefinition,
  type EndPlayInput,
  type EndPlayPolicy,
  type EndPlayResult,
  type FieldMessage,
  type HandRollEvaluation,
  type HandRollGrid,
  type HandRollProcedure,
  type VisualFinding,
  VISUAL_FINDINGS,
} from "@/lib/field";
import { safetyFlagOf } from "@/lib/cases/safety-flag";
import { DASH } from "./format";
import type { EndPlaySection, FieldSection, HandRollSection, Note, ReportSourceSite, Row } from "./types";

type Checks = {
  handRoll?: { grid?: HandRollGrid; procedure?: Partial<HandRollProcedure> };
  endPlay?: EndPlayInput;
  visual?: VisualFinding[];
  waysideAlarmConfirmed?: boolean;
  confirmations?: Record<string, boolean | undefined>;
};

const FEEL: Record<string, string> = { smooth: "Smooth", stiff: "Stiff", rough: "Rough", catch: "Catch" };
const CALL_LABEL = { keep: "Keep in service", remove: "Remove from service", undecided: "Not decided" } as const;
const END_PLAY_CALL: Record<EndPlayResult["call"], string> = {
  incomplete: "No usable reading",
  within: "Within the limit",
  "over-limit": "Over the limit: remove",
  "tight-remove": "Zero and will not turn: remove",
  "tight-remeasure": "Zero but turns freely: re-measure",
  "tight-unknown": "Zero: turning by hand not stated",
};
const CONFIRMATIONS: [string, string][] = [
  ["ppe", "Protective equipment worn"],
  ["blueSignal", "Blue-signal protection in place"],
  ["wheelsetSecured", "Wheelset out from under the car and secured"],
  ["cooled", "Bearing cool enough to handle"],
];

const notes = (messages: FieldMessage[]): Note[] => messages.map((m) => ({ level: m.level, text: m.text }));
const yesNo = (v: boolean | undefined, yes: string, no: string) => (v === undefined ? "Not stated" : v ? yes : no);

function handRollSection(hr: NonNullable<Checks["handRoll"]>, evaluation: HandRollEvaluation): HandRollSection {
  const grid = hr.grid ?? {};
  const cell = (p: number, d: "pull" | "push") => {
    const c = grid[p as 0]?.[d];
    if (!c?.feel) return "Not checked";
    return `${FEEL[c.feel] ?? c.feel}${c.revolutions !== undefined ? ` · ${c.revolutions} rev` : ""}`;
  };
  const p = hr.procedure ?? {};
  return {
    grid: AXLE_POSITIONS.map((pos) => [`${pos}°`, cell(pos, "pull"), cell(pos, "push")]),
    procedure: [
      ["Turned by", p.turnedBy === undefined ? "Not stated" : p.turnedBy === "hand" ? "Hand" : "Foot (not a valid check)"],
      ["Direction", yesNo(p.oneDirection, "One direction", "Oscillated (not a valid check)")],
      ["Judged by", p.judgedBy === undefined ? "Not stated" : p.judgedBy === "feel" ? "Feel" : "Ear (not a valid check)"],
    ],
    result: {
      keep: "No roughness or catch",
      remove: "Roughness or catch: remove",
      "not-valid": "Not a valid check",
      incomplete: "Not complete",
    }[evaluation.result],
    notes: notes(evaluation.messages),
  };
}

function endPlaySection(ep: EndPlayInput, result: EndPlayResult, policy: EndPlayPolicy): EndPlaySection {
  const unit = ep.unit === "mm" ? "mm" : "in";
  const typed = (v: number | string | undefined) => (v === undefined || v === "" ? DASH : `${v} ${unit}`);
  const byTrial = new Map(result.trials.map((t) => [t.trial, t]));
  const trials = ep.trials.map((t, i) => {
    const value = byTrial.get(i + 1);
    return {
      trial: i + 1,
      zero: ep.method === "dial" ? typed(t.zero) : DASH,
      reading: typed(t.reading),
      endPlayIn: value ? formatInches(value.in) : "not usable",
      endPlayMm: value ? formatMm(value.mm) : DASH,
    };
  });
  const allowed = ep.method === "dial" ? policy.dialSpreadIn : policy.tapeSpreadIn;
  const arithmetic: Row[] =
    result.call === "incomplete"
      ? []
      : [
          [
            "Mean of usable trials",
            `${formatInches(result.meanIn)} = ${formatMm(result.meanMm)} (${result.count} ${result.count === 1 ? "trial" : "trials"})`,
          ],
          [
            "Spread (largest − smallest)",
            `${formatInches(result.spreadIn)} = ${formatMm(result.spreadMm)}; repeat limit ${formatInches(allowed)}`,
          ],
          ["Limit", `${formatInches(policy.maxIn)} = ${formatMm(inToMm(policy.maxIn))} (${nearestSixtyFourth(policy.maxIn)})`],
        ];
  return {
    method: ep.method === "dial" ? "Dial indicator: end play = reading − zero" : "Metal tape: the reading is the end play",
    unitNote: `Readings in ${unit}; 1 in = 25.4 mm`,
    trials,
    arithmetic,
    call: END_PLAY_CALL[result.call],
    removes: result.removes,
    notes: notes(result.messages),
  };
}

export function buildFieldSection(
  raw: Record<string, unknown>,
  site: ReportSourceSite | null,
  stored: { fieldCall: string | null; fieldNotes: string; trigger?: string | null },
): FieldSection {
  const checks = raw as Checks;
  const policy: EndPlayPolicy = site
    ? { maxIn: site.endPlayMaxIn, dialSpreadIn: site.dialSpreadIn, tapeSpreadIn: site.tapeSpreadIn, plausibleMaxIn: site.plausibleMaxIn }
    : DEFAULT_END_PLAY_POLICY;
  const handRoll = checks.handRoll ? evaluateHandRoll(checks.handRoll.grid ?? {}, checks.handRoll.procedure ?? {}) : undefined;
  const hasTrials = Array.isArray(checks.endPlay?.trials) && checks.endPlay.trials.length > 0;
  const endPlay = checks.endPlay && hasTrials ? evaluateEndPlay(checks.endPlay, policy) : undefined;
  const visual = (Array.isArray(checks.visual) ? checks.visual : []).filter((v) => VISUAL_FINDINGS.some((d) => d.code === v?.code));
  const safetyFlag = safetyFlagOf(raw, stored.trigger);
  const call = decideFieldCall({
    handRoll,
    endPlay,
    visual,
    waysideAlarmConfirmed: checks.waysideAlarmConfirmed,
    safetyUnconfirmed: safetyFlag,
  });
  const confirmations = checks.confirmations ?? {};
  return {
    handRoll: checks.handRoll && handRoll ? handRollSection(checks.handRoll, handRoll) : null,
    endPlay: checks.endPlay && endPlay ? endPlaySection(checks.endPlay, endPlay, policy) : null,
    visual: visual.map((v) => [visualFindingDefinition(v.code).label, v.note?.trim() || DASH]),
    confirmations: CONFIRMATIONS.map(([key, label]) => [label, confirmations[key] === true ? "Confirmed" : "Not confirmed"]),
    call: { call: call.call, label: CALL_LABEL[call.call], reasons: call.reasons.map((r) => ({ level: r.level, text: r.text })) },
    storedCallDiffers:
      stored.fieldCall && stored.fieldCall !== call.call
        ? (CALL_LABEL[stored.fieldCall as keyof typeof CALL_LABEL] ?? stored.fieldCall)
        : null,
    notes: stored.fieldNotes.trim(),
    safetyFlag: safetyFlag.map((f) => f.text),
  };
}
