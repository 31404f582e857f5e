// Related cases: both cases must be readable by the caller; the link is written both ways and
// each answer lists the links the caller may read.
import "server-only";
import { addCaseLink, listCaseLinks, removeCaseLink } from "@/db/queries/case-links";
import type { Case } from "@/db/schema";
import type { CurrentUser } from "@/lib/auth/session";
import { badRequest } from "@/lib/http/errors";
import { loadReadableCase } from "./service";
import type { CaseLinkItem } from "./types";

export async function caseLinks(c: Pick<Case, "id">, user: CurrentUser): Promise<CaseLinkItem[]> {
  return listCaseLinks(c.id, user);
}

/** Links c to the case named by number or id (404 when the caller may not read it). */
export async function linkCase(c: Case, relatedKey: string, note: string, user: CurrentUser): Promise<CaseLinkItem[]> {
  const other = await loadReadableCase(relatedKey, user);
  if (other.id === c.id) throw badRequest("A case cannot be linked to itself.");
  await addCaseLink(c, other, note, user);
  return listCaseLinks(c.id, user);
}

export async function unlinkCase(c: Case, relatedKey: string, user: CurrentUser): Promise<CaseLinkItem[]> {
  const other = await loadReadableCase(relatedKey, user);
  await removeCaseLink(c, other, user);
  return listCaseLinks(c.id, user);
}
