// The safety confirmations asked before the hand roll, and which ones a filing left unticked.

export const SAFETY_CONFIRMATIONS = [
  {
    key: "blueSignal",
    label: "Blue-signal protection is in place",
    caution:
      "work on, under or between cars only under blue-signal protection, as your employer's procedures and the applicable rules require.",
  },
  {
    key: "wheelsetSecured",
    label: "Wheelset is out from under the car and secured against rolling",
    caution: "the wheelset must be out from under the car and secured against rolling before anyone handles the bearing.",
  },
  { key: "ppe", label: "Required protective equipment is worn", caution: "wear the protective equipment your employer requires." },
  {
    key: "cooled",
    label: "A hot bearing has cooled enough to handle",
    caution: "a bearing that set off a hot-bearing alarm can burn; let it cool before handling it.",
  },
] as const;

export type SafetyKey = (typeof SAFETY_CONFIRMATIONS)[number]["key"];

/** "cooled" only applies where the removal came from a hot-bearing alarm. */
export function safetyConfirmationsFor(trigger: string | null | undefined) {
  return SAFETY_CONFIRMATIONS.filter((c) => c.key !== "cooled" || trigger === "wayside-hot");
}

/** The confirmations that apply to this trigger and were not ticked, with the caution to show beside each. */
export function unconfirmedSafety(confirmations: Partial<Record<SafetyKey, boolean>> | undefined, trigger: string | null | undefined) {
  return safetyConfirmationsFor(trigger)
    .filter((c) => confirmations?.[c.key] !== true)
    .map((c) => ({ key: c.key, label: c.label, text: `${c.label.toLowerCase()} — ${c.caution}` }));
}
