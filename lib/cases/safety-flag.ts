// The safety flag a case carries when a filing left safety confirmations unticked: computed from the stored
// confirmations and trigger, so the case page, sign-off and report always agree with the record.
import { unconfirmedSafety } from "@/lib/field";

export type SafetyFlag = { key: string; label: string; text: string }[];

/** Empty when every confirmation that applies to the trigger was ticked, or when no field report was filed yet. */
export function safetyFlagOf(fieldChecks: unknown, trigger: string | null | undefined): SafetyFlag {
  if (!fieldChecks || typeof fieldChecks !== "object" || !trigger) return [];
  const confirmations = (fieldChecks as { confirmations?: Record<string, boolean | undefined> }).confirmations;
  return unconfirmedSafety(confirmations ?? {}, trigger);
}

export const SAFETY_FLAG_TITLE = "Safety flag: confirmations left unticked at filing";
export const SAFETY_FLAG_DEFERRAL =
  "Check with the shop that the work was done under the employer's procedures, the applicable interchange rules and local codes.";
