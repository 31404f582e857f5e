// The case list: one filtered, sorted page with its total, and the whole filtered set for export.
// Every query is held to what the viewer may read (canReadCase, written as SQL).
import "server-only";
import { and, eq, gte, inArray, lte, sql, type SQL } from "drizzle-orm";
import { alias, type AnyPgColumn } from "drizzle-orm/pg-core";
import { db } from "@/db";
import { caseListCounts, cases, codeEntries, sites } from "@/db/schema";
import type { CaseColumnId, CaseListRow } from "@/lib/cases/list-columns";
import { CSV_HEADER, csvValues, EXPORT_CAP } from "@/lib/cases/list-csv";
import type { CaseFilters, CaseSort } from "@/lib/cases/list-params";
import { csvRow } from "@/lib/csv";
import { readableCases } from "./case-scope";

export type CaseListViewer = { id: string; role: string; siteId: string | null };

const triggerCode = alias(codeEntries, "trigger_code");
const causeCode = alias(codeEntries, "cause_code");

const rowColumns = {
  id: cases.id,
  number: cases.number,
  status: cases.status,
  carMark: cases.carMark,
  carNumber: cases.carNumber,
  axle: cases.axle,
  side: cases.side,
  serial: cases.serial,
  bearingClass: cases.bearingClass,
  bearingClassOther: cases.bearingClassOther,
  trigger: cases.trigger,
  triggerLabel: sql<string>`coalesce(${triggerCode.label}, ${cases.trigger})`,
  fieldCall: cases.fieldCall,
  endPlayMeanIn: cases.endPlayMeanIn,
  removedOn: cases.removedOn,
  siteCode: sites.code,
  siteName: sites.name,
  primaryCause: cases.primaryCause,
  causeLabel: sql<string | null>`coalesce(${causeCode.label}, ${cases.primaryCause})`,
  removalConfirmed: cases.removalConfirmed,
  serviceMonths: cases.serviceMonths,
  updatedAt: cases.updatedAt,
};

const likeEscape = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

function textMatch(q: string): SQL[] {
  const hay = sql`concat_ws(' ', ${cases.number}, ${cases.serial}, ${cases.carMark}, ${cases.carNumber}, ${cases.carMark} || ${cases.carNumber})`;
  return q
    .split(/\s+/)
    .filter(Boolean)
    .slice(0, 8)
    .map((term) => sql`${hay} ilike ${`%${likeEscape(term)}%`}`);
}

type FilterColumns = { [K in "createdBy" | "siteId" | "status" | "trigger" | "primaryCause" | "bearingClass"]: AnyPgColumn };

/** The filters the count cells can answer: every one but a removal-date range and free text. */
export const countedByCells = (f: CaseFilters): boolean => !f.from && !f.to && !f.q;

/** The viewer's reach and the filters, over cases or (only what countedByCells allows) over the count cells. */
export function caseListWhere(f: CaseFilters, viewer: CaseListViewer, on: FilterColumns = cases): SQL | undefined {
  return and(
    readableCases(viewer, { createdBy: on.createdBy, siteId: on.siteId }),
    f.status?.length ? inArray(on.status, f.status) : undefined,
    f.trigger?.length ? inArray(on.trigger, f.trigger) : undefined,
    f.cause?.length ? inArray(on.primaryCause, f.cause) : undefined,
    f.class?.length ? inArray(on.bearingClass, f.class) : undefined,
    f.site?.length ? inArray(sites.code, f.site) : undefined,
    f.from ? gte(cases.removedOn, f.from) : undefined,
    f.to ? lte(cases.removedOn, f.to) : undefined,
    ...(f.q ? textMatch(f.q) : []),
  );
}

// Whitelisted sort expressions; the URL only ever picks a key of this map.
const SORT_EXPRESSIONS: Record<CaseColumnId, SQL[]> = {
  number: [sql`${cases.number}`],
  status: [sql`array_position(array['field','bench','signoff','signed']::text[], ${cases.status})`],
  car: [sql`nullif(${cases.carMark}, '')`, sql`length(${cases.carNumber})`, sql`${cases.carNumber}`],
  position: [sql`${cases.axle}`, sql`${cases.side}`],
  serial: [sql`nullif(${cases.serial}, '')`],
  class: [sql`nullif(${cases.bearingClass}, '')`, sql`${cases.bearingClassOther}`],
  trigger: [sql`coalesce(${triggerCode.label}, ${cases.trigger})`],
  fieldCall: [sql`${cases.fieldCall}`],
  endPlay: [sql`${cases.endPlayMeanIn}`],
  removedOn: [sql`${cases.removedOn}`],
  site: [sql`${sites.code}`],
  cause: [sql`coalesce(${causeCode.label}, ${cases.primaryCause})`],
  outcome: [sql`${cases.removalConfirmed}`],
  serviceMonths: [sql`${cases.serviceMonths}`],
  updatedAt: [sql`${cases.updatedAt}`],
};

export function caseListOrder(sort: CaseSort): SQL[] {
  const dir = sort.dir === "asc" ? sql.raw("asc") : sql.raw("desc");
  // Empty values last either way; the case number breaks ties so pages never overlap ("nulls last"
  // on a column that has none, so the order matches the cases_list_*_idx indexes).
  return [...SORT_EXPRESSIONS[sort.field].map((e) => sql`${e} ${dir} nulls last`), sql`${cases.number} desc nulls last`];
}

const onSite = eq(sites.id, cases.siteId);
const onTrigger = and(eq(triggerCode.list, "trigger"), eq(triggerCode.code, cases.trigger));
const onCause = and(eq(causeCode.list, "cause"), eq(causeCode.code, cases.primaryCause));
const totalOver = sql<number>`count(*) over()`.mapWith(Number);

type RawRow = Omit<CaseListRow, "updatedAt"> & { updatedAt: Date };
const toRow = ({ updatedAt, ...r }: RawRow): CaseListRow => ({ ...r, updatedAt: updatedAt.toISOString() });

/** The site, trigger and cause codes of a filter that do not exist, in words ("site \"XX\""). */
export async function unknownFilterCodes(f: CaseFilters): Promise<string[]> {
  const missing = (asked: string[] | undefined, found: { code: string }[]) => (asked ?? []).filter((c) => !found.some((x) => x.code === c));
  const listCodes = (list: "trigger" | "cause", asked?: string[]) =>
    asked?.length
      ? db
          .select({ code: codeEntries.code })
          .from(codeEntries)
          .where(and(eq(codeEntries.list, list), inArray(codeEntries.code, asked)))
      : [];
  const [foundSites, foundTriggers, foundCauses] = await Promise.all([
    f.site?.length ? db.select({ code: sites.code }).from(sites).where(inArray(sites.code, f.site)) : [],
    listCodes("trigger", f.trigger),
    listCodes("cause", f.cause),
  ]);
  const problems = [
    ...missing(f.site, foundSites).map((c) => `site "${c}"`),
    ...missing(f.trigger, foundTriggers).map((c) => `trigger "${c}"`),
    ...missing(f.cause, foundCauses).map((c) => `cause "${c}"`),
  ];
  return problems;
}

/**
 * How many cases match, exactly. Without a date range or text every filter is a column of
 * case_list_counts, whose cells (kept by triggers on cases) are summed within the viewer's reach;
 * otherwise the cases are counted (a date range from cases_list_count_day_idx alone).
 */
export async function countCases(filters: CaseFilters, viewer: CaseListViewer): Promise<number> {
  if (countedByCells(filters)) {
    const total = sql<number>`coalesce(sum(${caseListCounts.n}), 0)`.mapWith(Number);
    const where = caseListWhere(filters, viewer, caseListCounts);
    const [row] = filters.site?.length
      ? await db.select({ n: total }).from(caseListCounts).innerJoin(sites, eq(sites.id, caseListCounts.siteId)).where(where)
      : await db.select({ n: total }).from(caseListCounts).where(where);
    return row.n;
  }
  const where = caseListWhere(filters, viewer);
  const [row] = filters.site?.length
    ? await db
        .select({ n: sql<number>`count(*)`.mapWith(Number) })
        .from(cases)
        .innerJoin(sites, onSite)
        .where(where)
    : await db
        .select({ n: sql<number>`count(*)`.mapWith(Number) })
        .from(cases)
        .where(where);
  return row.n;
}

export async function listCases(
  filters: CaseFilters,
  sort: CaseSort,
  page: number,
  pageSize: number,
  viewer: CaseListViewer,
): Promise<{ rows: CaseListRow[]; total: number }> {
  const where = caseListWhere(filters, viewer);
  // The page and the total side by side: a window count would make PostgreSQL read and sort every
  // matching row for 25 of them, where the page alone walks an index (cases_list_*_idx) and stops;
  // the total sums the count cells (or, for a date range or text, counts the cases). The page is
  // picked by case number first, with only the joins its filters and order need, so the rows a deep
  // page skips are read from the index alone and the labels are looked up for the 25 it shows.
  const needsSite = Boolean(filters.site?.length) || sort.field === "site";
  let pick = db.select({ number: cases.number }).from(cases).$dynamic();
  if (needsSite) pick = pick.leftJoin(sites, onSite);
  if (sort.field === "trigger") pick = pick.leftJoin(triggerCode, onTrigger);
  if (sort.field === "cause") pick = pick.leftJoin(causeCode, onCause);
  const onPage = pick
    .where(where)
    .orderBy(...caseListOrder(sort))
    .limit(pageSize)
    .offset((page - 1) * pageSize)
    .as("on_page");
  const [found, total] = await Promise.all([
    db
      .select(rowColumns)
      .from(onPage)
      .innerJoin(cases, eq(cases.number, onPage.number))
      .leftJoin(sites, onSite)
      .leftJoin(triggerCode, onTrigger)
      .leftJoin(causeCode, onCause)
      .orderBy(...caseListOrder(sort)),
    countCases(filters, viewer),
  ]);
  return { rows: found.map((r) => toRow(r)), total };
}

export type CaseExport = { total: number; capped: boolean; cap: number; batches: () => AsyncGenerator<CaseListRow[]> };

/**
 * Every matching case, in list order, up to `cap`. The ids and the total are fixed first; rows are
 * then read in batches so a large export never sits whole in memory.
 */
export async function exportCases(
  filters: CaseFilters,
  sort: CaseSort,
  viewer: CaseListViewer,
  opts: { cap?: number; batchSize?: number } = {},
): Promise<CaseExport> {
  const cap = opts.cap ?? EXPORT_CAP;
  const batchSize = opts.batchSize ?? 1000;
  const picked = await db
    .select({ id: cases.id, total: totalOver })
    .from(cases)
    .leftJoin(sites, onSite)
    .leftJoin(triggerCode, onTrigger)
    .leftJoin(causeCode, onCause)
    .where(caseListWhere(filters, viewer))
    .orderBy(...caseListOrder(sort))
    .limit(cap);
  const total = picked[0]?.total ?? 0;
  const ids = picked.map((p) => p.id);
  async function* batches() {
    for (let i = 0; i < ids.length; i += batchSize) {
      const slice = ids.slice(i, i + batchSize);
      const got = await db
        .select(rowColumns)
        .from(cases)
        .leftJoin(sites, onSite)
        .leftJoin(triggerCode, onTrigger)
        .leftJoin(causeCode, onCause)
        .where(inArray(cases.id, slice));
      const byId = new Map(got.map((r) => [r.id, toRow(r)]));
      yield slice.map((id) => byId.get(id)).filter((r): r is CaseListRow => r !== undefined);
    }
  }
  return { total, capped: total > ids.length, cap, batches };
}

/** The export as CSV bytes: a UTF-8 byte-order mark (so spreadsheets read accents), the header, the rows. */
export async function streamCasesCsv(
  filters: CaseFilters,
  sort: CaseSort,
  viewer: CaseListViewer,
  opts: { cap?: number } = {},
): Promise<Omit<CaseExport, "batches"> & { stream: ReadableStream<Uint8Array> }> {
  const { batches, ...info } = await exportCases(filters, sort, viewer, opts);
  const encoder = new TextEncoder();
  const rows = batches();
  const stream = new ReadableStream<Uint8Array>({
    start(controller) {
      controller.enqueue(encoder.encode(`\uFEFF${csvRow(CSV_HEADER)}`));
    },
    async pull(controller) {
      const next = await rows.next();
      if (next.done) controller.close();
      else controller.enqueue(encoder.encode(next.value.map((r) => csvRow(csvValues(r))).join("")));
    },
    async cancel() {
      await rows.return(undefined);
    },
  });
  return { ...info, stream };
}
