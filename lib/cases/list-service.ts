// The case list and its CSV for one reader: codes in the filters are checked first (a typo gets a
// 400 naming it, not an empty list), then db/queries/case-list.ts reads within the reader's reach.
import "server-only";
import { listCases, streamCasesCsv, unknownFilterCodes, type CaseListViewer } from "@/db/queries/case-list";
import { caseListOptions } from "@/db/queries/case-list-options";
import { badRequest } from "@/lib/http/errors";
import type { CaseFilters, CaseSort } from "./list-params";
import type { CaseListOptions } from "./types";

async function assertKnownCodes(filters: CaseFilters): Promise<void> {
  const problems = await unknownFilterCodes(filters);
  if (problems.length) throw badRequest(`Unknown ${problems.join(", ")}.`, { unknown: problems });
}

export async function caseListPage(filters: CaseFilters, sort: CaseSort, page: number, pageSize: number, viewer: CaseListViewer) {
  await assertKnownCodes(filters);
  return listCases(filters, sort, page, pageSize, viewer);
}

export async function caseListCsv(filters: CaseFilters, sort: CaseSort, viewer: CaseListViewer) {
  await assertKnownCodes(filters);
  return streamCasesCsv(filters, sort, viewer);
}

/** The choices the list's filter bar offers: sites, triggers and causes (retired ones marked). */
export async function caseFilterChoices(): Promise<CaseListOptions> {
  return caseListOptions();
}
