// What a search asks for, as it travels in the URL: free text, multi-select facets
// (comma-separated, so a link holds the whole search), a minimum severity, a date range,
// a sort and a page. The API refuses what it cannot read; the page drops it and says so.
import { z } from "@/lib/validation/zod";

export const MULTI_FACETS = ["trigger", "cause", "code", "component", "class", "site", "status"] as const;
export type MultiFacet = (typeof MULTI_FACETS)[number];

export const SORTS = ["relevance", "newest", "oldest", "severity"] as const;
export type SearchSort = (typeof SORTS)[number];

export const PAGE_SIZE = 20;
const MAX_PAGE = 500;
const MAX_VALUES = 40;

const value = z
  .string()
  .trim()
  .min(1)
  .max(80)
  .regex(/^[\p{L}\p{N}][\p{L}\p{N} ._|/-]*$/u, "unexpected characters");

/** "a,b" or ["a", "b,c"] → ["a", "b", "c"], without repeats. */
const list = z
  .union([z.string().max(2000), z.array(z.string().max(400)).max(100)])
  .transform((v) => [
    ...new Set(
      (Array.isArray(v) ? v : [v])
        .flatMap((s) => s.split(","))
        .map((s) => s.trim())
        .filter(Boolean),
    ),
  ])
  .pipe(z.array(value).max(MAX_VALUES));

const isoDate = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, "use YYYY-MM-DD")
  .refine((s) => !Number.isNaN(Date.parse(s)), "not a date");

const fields = {
  q: z.string().max(200, "keep the search under 200 characters").default(""),
  trigger: list.default([]),
  cause: list.default([]),
  code: list.default([]),
  component: list.default([]),
  class: list.default([]),
  site: list.default([]),
  status: list.pipe(z.array(z.enum(["field", "bench", "signoff", "signed"]))).default([]),
  severity: z.coerce.number().int().min(0).max(4).optional(),
  from: isoDate.optional(),
  to: isoDate.optional(),
  sort: z.enum(SORTS).default("relevance"),
  page: z.coerce.number().int().min(1).max(MAX_PAGE).default(1),
};

export const searchParamsSchema = z.object(fields);
export type SearchParams = z.output<typeof searchParamsSchema>;

type RawParams = Record<string, string | string[] | undefined>;

/** An empty field of a form ("from=") means the same as no field. */
function withoutEmpty(raw: RawParams): RawParams {
  return Object.fromEntries(
    Object.entries(raw).filter(([, v]) => v !== undefined && v !== "" && !(Array.isArray(v) && v.every((x) => x === ""))),
  );
}

/** Strict: for the API, where a bad parameter is the caller's mistake (400). */
export function parseSearchParams(raw: RawParams): SearchParams {
  return searchParamsSchema.parse(withoutEmpty(raw));
}

/** Lenient: for the page, where a hand-edited link should still show something. */
export function readSearchParams(raw: RawParams): { params: SearchParams; dropped: string[] } {
  const dropped: string[] = [];
  const clean: RawParams = {};
  const given = withoutEmpty(raw);
  for (const [key, schema] of Object.entries(fields)) {
    if (given[key] === undefined) continue;
    if (schema.safeParse(given[key]).success) clean[key] = given[key];
    else dropped.push(key);
  }
  return { params: searchParamsSchema.parse(clean), dropped };
}

/** URLSearchParams → the record the parsers read, keeping repeated keys. */
export function recordOf(sp: URLSearchParams): RawParams {
  const out: Record<string, string | string[]> = {};
  for (const key of new Set(sp.keys())) {
    const all = sp.getAll(key);
    out[key] = all.length > 1 ? all : all[0];
  }
  return out;
}

export function hasCriteria(p: SearchParams): boolean {
  return p.q.trim() !== "" || MULTI_FACETS.some((f) => p[f].length > 0) || p.severity !== undefined || !!p.from || !!p.to;
}
