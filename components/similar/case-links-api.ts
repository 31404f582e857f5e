// The requests the similar-case and related-case panels make, and the keys they share so
// linking from one panel refreshes the other.
import type { CaseLinkItem } from "@/db/queries/case-links";
import type { SimilarCaseItem } from "@/db/queries/similar";

export const similarKey = (caseId: string) => `/api/cases/${encodeURIComponent(caseId)}/similar`;
export const linksKey = (caseId: string) => `/api/cases/${encodeURIComponent(caseId)}/links`;

export type SimilarAnswer = { caseId: string; number: string; similar: SimilarCaseItem[] };
export type LinksAnswer = { caseId: string; links: CaseLinkItem[] };

async function answer<T>(res: Response): Promise<T> {
  const body = await res.json().catch(() => ({}));
  if (!res.ok) throw new Error((body as { error?: string }).error ?? `The server answered ${res.status}.`);
  return body as T;
}

export const getJson = <T,>(url: string) => fetch(url, { headers: { accept: "application/json" } }).then((r) => answer<T>(r));

export function linkCase(caseId: string, relatedId: string, note: string) {
  return fetch(linksKey(caseId), {
    method: "POST",
    headers: { "content-type": "application/json" },
    body: JSON.stringify({ relatedId, note }),
  }).then((r) => answer<LinksAnswer>(r));
}

export function unlinkCase(caseId: string, relatedId: string) {
  return fetch(`${linksKey(caseId)}?relatedId=${encodeURIComponent(relatedId)}`, { method: "DELETE" }).then((r) => answer<LinksAnswer>(r));
}
