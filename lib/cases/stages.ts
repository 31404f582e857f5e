// The four stages of a case, in order, with the words the screens use.
export const STAGES = ["field", "bench", "signoff", "signed"] as const;
export type Stage = (typeof STAGES)[number];

export const STAGE_LABELS: Record<Stage, string> = {
  field: "Field report",
  bench: "On the bench",
  signoff: "Awaiting sign-off",
  signed: "Signed",
};
