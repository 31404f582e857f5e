// What Tearline works out from a case's entries: the field call, end-play mean and service time.
import {
  decideFieldCall,
  evaluateEndPlay,
  evaluateHandRoll,
  monthsBetween,
  unconfirmedSafety,
  type EndPlayPolicy,
  type HandRollGrid,
  type VisualFinding,
} from "@/lib/field";
import type { FieldChecks } from "./schemas";

export type FieldCallSummary = {
  fieldCall: "keep" | "remove" | "undecided";
  fieldCallReasons: ReturnType<typeof decideFieldCall>["reasons"];
  endPlayMeanIn: number | null;
};

/** `trigger` decides which safety confirmations apply and whether end play is required (site policy). */
export function evaluateFieldChecks(checks: FieldChecks, policy: EndPlayPolicy, trigger?: string | null) {
  const handRoll = checks.handRoll ? evaluateHandRoll(checks.handRoll.grid as HandRollGrid, checks.handRoll.procedure) : undefined;
  const endPlay = checks.endPlay && checks.endPlay.trials.length ? evaluateEndPlay(checks.endPlay, policy) : undefined;
  const safetyUnconfirmed = unconfirmedSafety(checks.confirmations, trigger);
  const endPlayRequired = !(trigger && policy.endPlayOptionalFor?.includes(trigger));
  const call = decideFieldCall({
    handRoll,
    endPlay,
    visual: checks.visual as VisualFinding[],
    waysideAlarmConfirmed: checks.waysideAlarmConfirmed,
    endPlayRequired,
    safetyUnconfirmed,
  });
  return { handRoll, endPlay, call, safetyUnconfirmed };
}

export function summariseFieldChecks(checks: FieldChecks, policy: EndPlayPolicy, trigger?: string | null): FieldCallSummary {
  const { endPlay, call } = evaluateFieldChecks(checks, policy, trigger);
  return {
    fieldCall: call.call,
    fieldCallReasons: call.reasons,
    endPlayMeanIn: endPlay && endPlay.call !== "incomplete" ? Number(endPlay.meanIn.toFixed(5)) : null,
  };
}

export function serviceMonthsOf(mountedOn: string | null | undefined, removedOn: string | null | undefined): number | null {
  if (!mountedOn || !removedOn || removedOn < mountedOn) return null;
  return Number(monthsBetween(mountedOn, removedOn).toFixed(2));
}
