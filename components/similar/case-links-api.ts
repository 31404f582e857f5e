// The requests the similar-case and related-case panels make, and the keys they share so
// linking from one panel refreshes the other.
import type { CaseLinkItem, SimilarCaseItem } from "@/lib/cases/types";
import { ApiError, callApi, getOrThrow, type ApiResult } from "@/lib/client/api";

export const similarKey = (caseId: string) => `/api/cases/${encodeURIComponent(caseId)}/similar`;
export const linksKey = (caseId: string) => `/api/cases/${encodeURIComponent(caseId)}/links`;

export type SimilarAnswer = { caseId: string; number: string; similar: SimilarCaseItem[] };
export type LinksAnswer = { caseId: string; links: CaseLinkItem[] };

/** Throws an ApiError (a plain message) when refused, for the panels' try/catch and SWR. */
async function orThrow<T>(pending: Promise<ApiResult<T>>): Promise<T> {
  const r = await pending;
  if (!r.ok) throw new ApiError(r);
  return r.data;
}

export const getJson = <T>(url: string) => getOrThrow<T>(url);

export function linkCase(caseId: string, relatedId: string, note: string) {
  return orThrow(callApi<LinksAnswer>("POST", linksKey(caseId), { json: { relatedId, note } }));
}

export function unlinkCase(caseId: string, relatedId: string) {
  return orThrow(callApi<LinksAnswer>("DELETE", `${linksKey(caseId)}?relatedId=${encodeURIComponent(relatedId)}`));
}
