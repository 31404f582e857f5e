// The filters every tally takes (period, site, bearing class, trigger, recurrence settings),
// read from a URL query so a filtered view can be shared as a link.
import { z } from "@/lib/validation/zod";

const month = z
  .string()
  .regex(/^\d{4}-(0[1-9]|1[0-2])$/, "Use a month written YYYY-MM.");

export const CLUSTER_KEYS = ["site", "car", "lot"] as const;
export type ClusterKey = (typeof CLUSTER_KEYS)[number];

const blankToUndefined = (v: unknown) => (typeof v === "string" && v.trim() === "" ? undefined : v);

export const tallyFiltersSchema = z
  .object({
    from: z.preprocess(blankToUndefined, month.optional()),
    to: z.preprocess(blankToUndefined, month.optional()),
    site: z.preprocess(blankToUndefined, z.string().max(40).optional()),
    class: z.preprocess(blankToUndefined, z.string().max(40).optional()),
    trigger: z.preprocess(blankToUndefined, z.string().max(60).optional()),
    cluster: z.preprocess(blankToUndefined, z.enum(CLUSTER_KEYS).default("site")),
    window: z.preprocess(blankToUndefined, z.coerce.number().int().min(1).max(365).default(30)),
  })
  .refine((f) => !f.from || !f.to || f.from <= f.to, { message: "The period must start before it ends.", path: ["to"] });

export type TallyFilters = z.infer<typeof tallyFiltersSchema>;

export const DEFAULT_FILTERS: TallyFilters = { cluster: "site", window: 30 };

/** Accepts a URLSearchParams-like record (Next's searchParams give string | string[]). */
export function parseTallyFilters(params: Record<string, string | string[] | undefined>): TallyFilters {
  const flat: Record<string, string> = {};
  for (const [k, v] of Object.entries(params)) {
    const value = Array.isArray(v) ? v[0] : v;
    if (value !== undefined) flat[k] = value;
  }
  return tallyFiltersSchema.parse(flat);
}

/** Like parseTallyFilters but falls back to the defaults for anything unreadable (pages never crash on a bad link). */
export function readTallyFilters(params: Record<string, string | string[] | undefined>): TallyFilters {
  try {
    return parseTallyFilters(params);
  } catch {
    return DEFAULT_FILTERS;
  }
}

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
