// The removal form's state: the field report as the API takes it, with helpers to update nested parts.
import type { FieldChecks, FieldReportInput } from "@/lib/cases/schemas";

export type RemovalDraft = FieldReportInput & { fieldChecks: FieldChecks };

export function emptyDraft(siteId: string | null): RemovalDraft {
  return {
    siteId,
    removedOn: new Date().toISOString().slice(0, 10),
    carMark: "",
    carNumber: "",
    axle: null,
    side: null,
    wheelDiameterIn: 36,
    trigger: "",
    triggerDetail: {},
    serial: "",
    bearingClass: undefined,
    makerCode: "",
    fieldNotes: "",
    fieldChecks: {
      visual: [],
      confirmations: {},
      // Nothing about how the check was done is assumed: the mechanic says it.
      handRoll: { grid: {}, procedure: {} },
      endPlay: { method: "dial", unit: "in", trials: [{ zero: "0", reading: "" }] },
    },
  };
}

export type Patch = (p: Partial<RemovalDraft>) => void;
export type ChecksPatch = (p: Partial<FieldChecks>) => void;

/** Drops empty end-play rows so a half-typed trial does not block saving. */
export function forSaving(d: RemovalDraft): RemovalDraft {
  const ep = d.fieldChecks.endPlay;
  const trials = ep ? ep.trials.filter((t) => String(t.reading ?? "").trim() !== "") : [];
  return {
    ...d,
    fieldChecks: { ...d.fieldChecks, endPlay: ep && trials.length ? { ...ep, trials } : undefined },
  };
}
