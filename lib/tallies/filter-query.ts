// The tally filters as the screens write them into a link, and the month arithmetic the tallies
// share. No validation library: the filter bar in the browser imports this; the server reads a
// query through the zod schema in filters.ts, which re-exports all of it.
export const CLUSTER_KEYS = ["site", "car", "lot"] as const;
export type ClusterKey = (typeof CLUSTER_KEYS)[number];

export type TallyFilters = {
  from?: string;
  to?: string;
  site?: string;
  class?: string;
  trigger?: string;
  cluster: ClusterKey;
  window: number;
};

export const DEFAULT_FILTERS: TallyFilters = { cluster: "site", window: 30 };

export function filtersToQuery(f: Partial<TallyFilters>): string {
  const q = new URLSearchParams();
  for (const key of ["from", "to", "site", "class", "trigger", "cluster", "window"] as const) {
    const v = f[key];
    if (v === undefined || v === null || v === "") continue;
    if (key === "cluster" && v === "site") continue;
    if (key === "window" && v === 30) continue;
    q.set(key, String(v));
  }
  return q.toString();
}

/** First day of the `from` month and first day after the `to` month, as YYYY-MM-DD. */
export function periodBounds(f: Pick<TallyFilters, "from" | "to">): { start?: string; endExclusive?: string } {
  const out: { start?: string; endExclusive?: string } = {};
  if (f.from) out.start = `${f.from}-01`;
  if (f.to) {
    const [y, m] = f.to.split("-").map(Number);
    const next = m === 12 ? `${y + 1}-01` : `${y}-${String(m + 1).padStart(2, "0")}`;
    out.endExclusive = `${next}-01`;
  }
  return out;
}

/** Months from `first` to `last` inclusive, both YYYY-MM. */
export function monthRange(first: string, last: string): string[] {
  const out: string[] = [];
  let [y, m] = first.split("-").map(Number);
  const [ly, lm] = last.split("-").map(Number);
  if (y * 12 + m > ly * 12 + lm) return out;
  while (y * 12 + m <= ly * 12 + lm && out.length < 1200) {
    out.push(`${y}-${String(m).padStart(2, "0")}`);
    m++;
    if (m > 12) {
      m = 1;
      y++;
    }
  }
  return out;
}

/** Shifts a YYYY-MM month by n months. */
export function addMonths(ym: string, n: number): string {
  const [y, m] = ym.split("-").map(Number);
  const index = y * 12 + (m - 1) + n;
  return `${Math.floor(index / 12)}-${String((index % 12) + 1).padStart(2, "0")}`;
}
