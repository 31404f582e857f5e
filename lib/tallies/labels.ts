// Words on charts. Code labels are the shared ones (lib/classification/labels.ts); a chart names
// the bar of cases without a cause.
import { causeLabel as labelOfCause } from "@/lib/classification/labels";

export const causeLabel = (code: string | null): string => (code === null ? "No cause recorded" : labelOfCause(code));

/** "42%" style share; one decimal below 10%. */
export function percent(share: number | null | undefined): string {
  if (share === null || share === undefined || !Number.isFinite(share)) return "–";
  const p = share * 100;
  return `${p < 10 && p > 0 ? p.toFixed(1) : Math.round(p)}%`;
}

export function monthLabel(ym: string): string {
  const [y, m] = ym.split("-").map(Number);
  const names = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];
  return `${names[m - 1]} ${y}`;
}

/** "58–66%"; with a narrow interval one decimal, so "95.0–95.3%" does not read "95–95%". */
export function percentRange(lower: number, upper: number): string {
  const narrow = upper - lower < 0.02;
  const f = (x: number) => (narrow ? (x * 100).toFixed(1) : String(Math.round(x * 100)));
  return `${f(lower)}–${f(upper)}%`;
}
