// The case list's state as it lives in the URL, without the validation library: the rules each value
// follows (allowed words, code shapes, limits and the words of every refusal), the reader the list
// screen uses in the browser, and writing the state back. The API and the export read the same query
// through the zod schema in list-params.ts, built from these rules; a unit test holds the two readers
// to the same answers.
import { BEARING_CLASSES } from "./bearing-classes";
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
export const LIST_KEYS = ["status", "trigger", "cause", "class", "site"] as const;
type ListKey = (typeof LIST_KEYS)[number];
const isListKey = (k: string) => (LIST_KEYS as readonly string[]).includes(k);

/** A value of only spaces is a value not given. */
export const isBlank = (v: unknown) => typeof v === "string" && v.trim() === "";

const CODE = /^[a-z0-9][a-z0-9.-]{0,59}$/;
const SITE_CODE = /^[A-Z0-9][A-Z0-9_-]{0,19}$/;

type ListRule = { what: string; ok: (item: string) => boolean; hint: string; normalise: (s: string) => string };
const same = (s: string) => s;

/** Each comma-list filter: what it names, which items it takes, and what to say about the others. */
export const LIST_RULES: Record<ListKey, ListRule> = {
  status: { what: "stage", ok: (s) => (STAGES as readonly string[]).includes(s), hint: `use ${STAGES.join(", ")}.`, normalise: same },
  trigger: {
    what: "trigger",
    ok: (s) => CODE.test(s),
    hint: "trigger codes are lower-case words joined by hyphens, like wayside-hot.",
    normalise: same,
  },
  cause: {
    what: "cause",
    ok: (s) => CODE.test(s),
    hint: "cause codes are lower-case words joined by hyphens, like water-ingress.",
    normalise: same,
  },
  class: {
    what: "bearing class",
    ok: (s) => (BEARING_CLASSES as readonly string[]).includes(s),
    hint: `use ${BEARING_CLASSES.join(", ")}.`,
    normalise: same,
  },
  site: {
    what: "site",
    ok: (s) => SITE_CODE.test(s),
    hint: "site codes are letters and digits, like MJC.",
    normalise: (s) => s.toUpperCase(),
  },
};
export const LIST_MAX_CHARS = 2000;
export const listTooLong = (what: string) => `${what}: the list is too long.`;

/** The items of a comma list, trimmed and normalised, repeats and blanks dropped; or the refusal naming the unknown ones. */
export function splitList(rule: ListRule, raw: string): { items: string[] } | { error: string } {
  const items = [
    ...new Set(
      raw
        .split(",")
        .map((s) => rule.normalise(s.trim()))
        .filter(Boolean),
    ),
  ];
  const bad = items.filter((i) => !rule.ok(i));
  return bad.length ? { error: `Unknown ${rule.what} ${bad.map((b) => `"${b}"`).join(", ")}; ${rule.hint}` } : { items };
}

export function isCalendarDay(s: string): boolean {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(s)) return false;
  const [y, m, d] = s.split("-").map(Number);
  const t = new Date(Date.UTC(y, m - 1, d));
  return t.getUTCFullYear() === y && t.getUTCMonth() === m - 1 && t.getUTCDate() === d;
}
export const DAY_MAX_CHARS = 10;
export const dayTooLong = (what: string) => `${what} must be written YYYY-MM-DD.`;
export const notADay = (what: string) => `${what} must be a real date written YYYY-MM-DD, like 2026-03-14.`;

export const Q_MAX_CHARS = 100;
export const Q_TOO_LONG = "Search text: at most 100 characters.";

export const BAD_SORT = `Sort must be a column and a direction, like removedOn:desc. Columns: ${CASE_COLUMN_IDS.join(", ")}.`;
/** A sort written column:direction, or null when it is not one. */
export function readSort(raw: string): CaseSort | null {
  const [field, dir, ...rest] = raw.split(":");
  if (rest.length || !(CASE_COLUMN_IDS as readonly string[]).includes(field) || (dir !== "asc" && dir !== "desc")) return null;
  return { field: field as CaseColumnId, dir };
}

/** Page and page size: what each is called and the whole numbers it may be. */
export const WHOLE_RULES = {
  page: { what: "Page", min: 1, max: 100_000, fallback: 1 },
  pageSize: { what: "Page size", min: 10, max: 200, fallback: DEFAULT_PAGE_SIZE },
} as const;
export const wholeWords = (what: string) => ({
  notNumber: `${what} must be a number.`,
  notWhole: `${what} must be a whole number.`,
  below: (min: number) => `${what} must be at least ${min}.`,
  above: (max: number) => `${what} must be at most ${max}.`,
});

export const RANGE_BACKWARDS = "The removal dates must run forward: From is after To.";

type QueryInput = URLSearchParams | Record<string, string | string[] | undefined>;

/** Flattens a query. A list key given twice is one comma list (?status=a&status=b); for any other key the last wins. */
export function flattenQuery(input: QueryInput): Record<string, string> {
  const out: Record<string, string> = {};
  const add = (k: string, v: string) => (out[k] = k in out && isListKey(k) ? `${out[k]},${v}` : v);
  if (input instanceof URLSearchParams) input.forEach((v, k) => add(k, v));
  else for (const [k, v] of Object.entries(input)) for (const one of [v ?? []].flat()) add(k, one);
  return out;
}

class Refused extends Error {}

function readWhole(key: keyof typeof WHOLE_RULES, raw: string | undefined): number {
  const { what, min, max, fallback } = WHOLE_RULES[key];
  if (raw === undefined || isBlank(raw)) return fallback;
  const n = Number(raw);
  const words = wholeWords(what);
  if (!Number.isFinite(n)) throw new Refused(words.notNumber);
  // A whole number here is a safe integer, as zod's int() holds it.
  if (!Number.isSafeInteger(n)) throw new Refused(words.notWhole);
  if (n < min) throw new Refused(words.below(min));
  if (n > max) throw new Refused(words.above(max));
  return n;
}

function readQuery(flat: Record<string, string>): ListParams {
  const filters: CaseFilters = {};
  const given = (key: string) => (key in flat && !isBlank(flat[key]) ? flat[key] : undefined);
  for (const key of LIST_KEYS) {
    const raw = given(key);
    if (raw === undefined) continue;
    const rule = LIST_RULES[key];
    if (raw.length > LIST_MAX_CHARS) throw new Refused(listTooLong(rule.what));
    const read = splitList(rule, raw);
    if ("error" in read) throw new Refused(read.error);
    if (read.items.length) (filters as Record<string, string[]>)[key] = read.items;
  }
  for (const [key, what] of [
    ["from", "From"],
    ["to", "To"],
  ] as const) {
    const raw = given(key);
    if (raw === undefined) continue;
    if (raw.length > DAY_MAX_CHARS) throw new Refused(dayTooLong(what));
    if (!isCalendarDay(raw)) throw new Refused(notADay(what));
    filters[key] = raw;
  }
  const q = given("q")?.trim();
  if (q !== undefined) {
    if (q.length > Q_MAX_CHARS) throw new Refused(Q_TOO_LONG);
    filters.q = q;
  }
  const rawSort = given("sort");
  const sort = rawSort === undefined ? DEFAULT_SORT : readSort(rawSort);
  if (!sort) throw new Refused(BAD_SORT);
  const page = readWhole("page", flat.page);
  const pageSize = readWhole("pageSize", flat.pageSize);
  if (filters.from && filters.to && filters.from > filters.to) throw new Refused(RANGE_BACKWARDS);
  return { filters, sort, page, pageSize };
}

/**
 * For the list screen: a bad link shows the default list and says why instead of failing. Gives the
 * same state, and the same first refusal, as the API's zod reading of the query.
 */
export function readListParams(input: QueryInput): { params: ListParams; error?: string } {
  try {
    return { params: readQuery(flattenQuery(input)) };
  } catch (e) {
    if (e instanceof Refused) return { params: DEFAULT_LIST_PARAMS, error: e.message };
    throw e;
  }
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
