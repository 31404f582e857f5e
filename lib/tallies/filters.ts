// The filters every tally takes (period, site, bearing class, trigger, recurrence settings),
// read from a URL query so a filtered view can be shared as a link.
import { z } from "@/lib/validation/zod";
import { CLUSTER_KEYS, DEFAULT_FILTERS, type TallyFilters } from "./filter-query";

export * from "./filter-query";

const month = z.string().regex(/^\d{4}-(0[1-9]|1[0-2])$/, "Use a month written YYYY-MM.");

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
  .refine((f) => !f.from || !f.to || f.from <= f.to, {
    message: "The period must start before it ends.",
    path: ["to"],
  }) satisfies z.ZodType<TallyFilters>;

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
