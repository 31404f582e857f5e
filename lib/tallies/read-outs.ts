// What the tally boards read off shaped data in the browser: out-of-control months, the words for
// an association's strength, dollars. Kept apart from the shaping modules so the boards do not carry
// the statistics code (or its library) that only the server runs.
import type { CauseSiteTally, MonthlyTally } from "./types";

/** Months beyond the limits, in words, newest first: "Water ingress: 14 in Mar 2026, above the upper limit 9.8". */
export function outOfControl(t: MonthlyTally): { series: string; month: string; count: number; side: "above" | "below"; limit: number }[] {
  const out: { series: string; month: string; count: number; side: "above" | "below"; limit: number }[] = [];
  for (const s of t.series) {
    s.beyond.forEach((b, i) => {
      if (b)
        out.push({ series: s.label, month: t.months[i], count: s.counts[i], side: b, limit: b === "above" ? s.upperLimit : s.lowerLimit });
    });
  }
  return out.sort((a, b) => b.month.localeCompare(a.month) || a.series.localeCompare(b.series));
}

/** Cramér's V in a sentence a manager can read. */
export function strengthWords(v: number | null, strength: CauseSiteTally["strength"]): string | null {
  if (v === null || strength === null) return null;
  const what = { negligible: "hardly at all", weak: "weakly", moderate: "moderately", strong: "strongly" }[strength];
  return `Site and cause go together ${what}: Cramér's V = ${v.toFixed(2)}, on a scale from 0 (the site tells nothing about the cause) to 1 (the site decides the cause).`;
}

export const usd = (x: number) => `$${Math.round(x).toLocaleString("en-US")}`;
