// The case list's state as it lives in the URL: filters, sort and page. One schema reads it for the
// API, the export and the page, so a shared link shows the same cases everywhere.
import { z } from "@/lib/validation/zod";
import { BEARING_CLASSES } from "./schemas";
import { CASE_COLUMN_IDS, columnInfo, type CaseColumnId } from "./list-columns";
import { STAGES, type Stage } from "./stages";

export type SortDir = "asc" | "desc";
export type CaseSort = { field: CaseColumnId; dir: SortDir };
export type CaseFilters = {
  status?: Stage[];
  trigger?: string[];
  cause?: string[];
  class?: string[];
  site?: string[];
  from?: string;
  to?: string;
  q?: string;
};
export type ListParams = { filters: CaseFilters; sort: CaseSort; page: number; pageSize: number };

export const PAGE_SIZES = [10, 25, 50, 100, 200] as const;
export const DEFAULT_SORT: CaseSort = { field: "updatedAt", dir: "desc" };
export const DEFAULT_PAGE_SIZE = 25;
export const DEFAULT_LIST_PARAMS: ListParams = { filters: {}, sort: DEFAULT_SORT, page: 1, pageSize: DEFAULT_PAGE_SIZE };
export const FILTER_KEYS = ["status", "trigger", "cause", "class", "site", "from", "to", "q"] as const;
const LIST_KEYS = ["status", "trigger", "cause", "class", "site"] as const;
const isListKey = (k: string) => (LIST_KEYS as readonly string[]).includes(k);

const blank = (v: unknown) => (typeof v === "string" && v.trim() === "" ? undefined : v);

/** A comma list, each item checked by `ok`; repeated or empty items are dropped. */
function commaList(what: string, ok: (item: string) => boolean, hint: string, normalise = (s: string) => s) {
  return z.preprocess(
    blank,
    z
      .string()
      .max(2000, `${what}: the list is too long.`)
      .transform((raw, ctx) => {
        const items = [...new Set(raw.split(",").map((s) => normalise(s.trim())).filter(Boolean))];
        const bad = items.filter((i) => !ok(i));
        if (bad.length) {
          ctx.addIssue({ code: "custom", message: `Unknown ${what} ${bad.map((b) => `"${b}"`).join(", ")}; ${hint}` });
          return z.NEVER;
        }
        return items;
      })
      .optional(),
  );
}

const CODE = /^[a-z0-9][a-z0-9.-]{0,59}$/;
const SITE_CODE = /^[A-Z0-9][A-Z0-9_-]{0,19}$/;

function isCalendarDay(s: string): boolean {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(s)) return false;
  const [y, m, d] = s.split("-").map(Number);
  const t = new Date(Date.UTC(y, m - 1, d));
  return t.getUTCFullYear() === y && t.getUTCMonth() === m - 1 && t.getUTCDate() === d;
}

const day = (what: string) =>
  z.preprocess(blank, z.string().max(10, `${what} must be written YYYY-MM-DD.`).refine(isCalendarDay, `${what} must be a real date written YYYY-MM-DD, like 2026-03-14.`).optional());

const sortSchema = z.preprocess(
  blank,
  z
    .string()
    .transform((raw, ctx): CaseSort => {
      const [field, dir, ...rest] = raw.split(":");
      if (rest.length || !(CASE_COLUMN_IDS as readonly string[]).includes(field) || (dir !== "asc" && dir !== "desc")) {
        ctx.addIssue({ code: "custom", message: `Sort must be a column and a direction, like removedOn:desc. Columns: ${CASE_COLUMN_IDS.join(", ")}.` });
        return z.NEVER;
      }
      return { field: field as CaseColumnId, dir };
    })
    .default(DEFAULT_SORT),
);

const whole = (what: string, min: number, max: number, fallback: number) =>
  z.preprocess(
    blank,
    z.coerce
      .number({ message: `${what} must be a number.` })
      .int(`${what} must be a whole number.`)
      .min(min, `${what} must be at least ${min}.`)
      .max(max, `${what} must be at most ${max}.`)
      .default(fallback),
  );

export const listParamsSchema = z
  .object({
    status: commaList("stage", (s) => (STAGES as readonly string[]).includes(s), `use ${STAGES.join(", ")}.`),
    trigger: commaList("trigger", (s) => CODE.test(s), "trigger codes are lower-case words joined by hyphens, like wayside-hot."),
    cause: commaList("cause", (s) => CODE.test(s), "cause codes are lower-case words joined by hyphens, like water-ingress."),
    class: commaList("bearing class", (s) => (BEARING_CLASSES as readonly string[]).includes(s), `use ${BEARING_CLASSES.join(", ")}.`),
    site: commaList("site", (s) => SITE_CODE.test(s), "site codes are letters and digits, like MJC.", (s) => s.toUpperCase()),
    from: day("From"),
    to: day("To"),
    q: z.preprocess(blank, z.string().trim().max(100, "Search text: at most 100 characters.").optional()),
    sort: sortSchema,
    page: whole("Page", 1, 100_000, 1),
    pageSize: whole("Page size", 10, 200, DEFAULT_PAGE_SIZE),
  })
  .refine((p) => !p.from || !p.to || p.from <= p.to, { message: "The removal dates must run forward: From is after To.", path: ["to"] })
  .transform(({ sort, page, pageSize, ...rest }): ListParams => {
    const filters: CaseFilters = {};
    for (const [k, v] of Object.entries(rest)) {
      if (v !== undefined && !(Array.isArray(v) && v.length === 0)) (filters as Record<string, unknown>)[k] = v;
    }
    return { filters, sort, page, pageSize };
  });

type QueryInput = URLSearchParams | Record<string, string | string[] | undefined>;

/** Flattens a query. A list key given twice is one comma list (?status=a&status=b); for any other key the last wins. */
export function flattenQuery(input: QueryInput): Record<string, string> {
  const out: Record<string, string> = {};
  const add = (k: string, v: string) => (out[k] = k in out && isListKey(k) ? `${out[k]},${v}` : v);
  if (input instanceof URLSearchParams) input.forEach((v, k) => add(k, v));
  else for (const [k, v] of Object.entries(input)) for (const one of [v ?? []].flat()) add(k, one);
  return out;
}

/** Reads the query; throws a ZodError (the API's 400) when something is wrong. */
export function parseListParams(input: QueryInput): ListParams {
  return listParamsSchema.parse(flattenQuery(input));
}

/** For pages: a bad link shows the default list and says why instead of failing. */
export function readListParams(input: QueryInput): { params: ListParams; error?: string } {
  const result = listParamsSchema.safeParse(flattenQuery(input));
  return result.success ? { params: result.data } : { params: DEFAULT_LIST_PARAMS, error: result.error.issues[0]?.message };
}

const enc = (s: string) => encodeURIComponent(s);

/** The canonical query string (no "?"): defaults left out, list items comma-joined, stable key order. */
export function listParamsToQuery(p: ListParams, opts: { paging?: boolean } = {}): string {
  const parts: string[] = [];
  for (const key of FILTER_KEYS) {
    const v = p.filters[key];
    if (v === undefined || v === "" || (Array.isArray(v) && !v.length)) continue;
    parts.push(`${key}=${Array.isArray(v) ? v.map(enc).join(",") : enc(v)}`);
  }
  if (p.sort.field !== DEFAULT_SORT.field || p.sort.dir !== DEFAULT_SORT.dir) parts.push(`sort=${p.sort.field}:${p.sort.dir}`);
  if (opts.paging !== false) {
    if (p.page !== 1) parts.push(`page=${p.page}`);
    if (p.pageSize !== DEFAULT_PAGE_SIZE) parts.push(`pageSize=${p.pageSize}`);
  }
  return parts.join("&");
}

/** New filters always go back to the first page: page 7 of the old set means nothing in the new one. */
export function withFilters(p: ListParams, patch: Partial<CaseFilters>): ListParams {
  const filters = { ...p.filters, ...patch };
  for (const key of FILTER_KEYS) {
    const v = filters[key];
    if (v === undefined || v === "" || (Array.isArray(v) && !v.length)) delete filters[key];
  }
  return { ...p, filters, page: 1 };
}

/** Clicking a header: the same column flips direction, another column starts in its natural one. */
export function toggleSort(p: ListParams, field: CaseColumnId): ListParams {
  const dir: SortDir = p.sort.field === field ? (p.sort.dir === "asc" ? "desc" : "asc") : columnInfo(field).firstDir;
  return { ...p, sort: { field, dir }, page: 1 };
}

/** How many filters are set; a date range counts once, whichever ends it has. */
export function activeFilterCount(f: CaseFilters): number {
  const lists = LIST_KEYS.filter((k) => f[k]?.length).length;
  return lists + (f.from || f.to ? 1 : 0) + (f.q ? 1 : 0);
}
