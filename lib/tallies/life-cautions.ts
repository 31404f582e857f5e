// When a Weibull fit's figures should not be taken at face value, in words: too few failures,
// heavy censoring, or a scale or B10 life far past anything the casebook has seen.

/** Below this many failures the parameters can move a long way with the next removal. */
export const FEW_FAILURES = 5;
/** Share of suspensions above which the figures lean on very few failures. */
export const HEAVY_CENSORING = 0.9;
/** A figure this many times the longest observed life is not shown as a bare number. */
export const FAR_BEYOND = 10;

export type LifeCautionKind = "few-failures" | "heavy-censoring" | "eta-beyond-data" | "b10-beyond-data";
export type LifeCaution = { kind: LifeCautionKind; text: string };

export type LifeCautionInput = { failures: number; suspensions: number; eta: number; b10: number; longestLife: number; unit: string };

const n = (v: number) => Math.round(v).toLocaleString("en-US");
const times = (v: number, of: number) => {
  const r = v / of;
  return r >= 10 ? `${n(r)} times` : `${r.toFixed(1)} times`;
};

export function lifeCautions(x: LifeCautionInput): LifeCaution[] {
  const out: LifeCaution[] = [];
  const units = x.failures + x.suspensions;
  if (x.failures < FEW_FAILURES) {
    out.push({
      kind: "few-failures",
      text: `Only ${x.failures} failures: one more removal can change the shape, scale and B10 a great deal. Read them as a first sign, not as figures to plan on.`,
    });
  }
  if (units > 0 && x.suspensions / units > HEAVY_CENSORING) {
    out.push({
      kind: "heavy-censoring",
      text: `${n(x.suspensions)} of ${n(units)} units (${Math.round((x.suspensions / units) * 100)}%) are suspensions — still in service or removed for another cause — so the fit leans on ${x.failures} failures and assumes the rest would fail the same way.`,
    });
  }
  if (x.longestLife > 0 && x.eta > x.longestLife) {
    out.push({
      kind: "eta-beyond-data",
      text: `The scale η is ${times(x.eta, x.longestLife)} the longest life observed (${n(x.longestLife)} ${x.unit}): the fitted line is carried past the data, so η is an extrapolation, not a measurement.`,
    });
  }
  if (x.longestLife > 0 && x.b10 > x.longestLife) {
    out.push({
      kind: "b10-beyond-data",
      text: `B10 lies beyond the longest life observed (${n(x.longestLife)} ${x.unit}): no unit has run that long, so no removal yet supports it.`,
    });
  }
  return out;
}

/** Short words for a table row: which cautions apply. */
export function cautionTags(cautions: readonly LifeCaution[]): string {
  const tag: Record<LifeCautionKind, string> = {
    "few-failures": "few failures",
    "heavy-censoring": "heavily censored",
    "eta-beyond-data": "beyond the data",
    "b10-beyond-data": "beyond the data",
  };
  return [...new Set(cautions.map((c) => tag[c.kind]))].join(" · ");
}

/** A life figure for a table: a number, or words when it is far past the longest observed life. */
export function lifeFigure(v: number, longestLife: number, format: (v: number) => string): string {
  if (longestLife > 0 && v > longestLife * FAR_BEYOND) return `over ${format(longestLife * FAR_BEYOND)}`;
  return format(v);
}
