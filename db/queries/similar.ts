// Reads for similar cases: the rows, photos, links and labels of the chosen candidates. Which
// candidates, their ranking and the shape the screen gets are lib/cases/similar-service.ts's.
import "server-only";
import { and, asc, eq, inArray } from "drizzle-orm";
import { db } from "@/db";
import { caseLinks, cases, codeEntries, photos, sites, type Case } from "@/db/schema";
import type { PhotoRef } from "@/lib/search/photo-pair";

export type SimilarCaseRow = {
  id: string;
  number: string;
  status: Case["status"];
  trigger: string;
  primaryCause: string | null;
  bearingClass: string;
  removedOn: string | null;
  siteName: string | null;
};

export type SimilarDetails = {
  rows: SimilarCaseRow[];
  photos: (PhotoRef & { caseId: string })[];
  linkedIds: string[];
  labels: { list: string; code: string; label: string }[];
};

/** Everything shown for the ranked candidates `topIds` of case `caseId` (whose photos are paired with theirs). */
export async function similarDetails(caseId: string, topIds: string[]): Promise<SimilarDetails> {
  const [rows, photoRows, links, labels] = await Promise.all([
    db
      .select({
        id: cases.id,
        number: cases.number,
        status: cases.status,
        trigger: cases.trigger,
        primaryCause: cases.primaryCause,
        bearingClass: cases.bearingClass,
        removedOn: cases.removedOn,
        siteName: sites.name,
      })
      .from(cases)
      .leftJoin(sites, eq(sites.id, cases.siteId))
      .where(inArray(cases.id, topIds)),
    db
      .select({ id: photos.id, caseId: photos.caseId, component: photos.component })
      .from(photos)
      .where(inArray(photos.caseId, [caseId, ...topIds]))
      .orderBy(asc(photos.createdAt), asc(photos.id)),
    db
      .select({ relatedId: caseLinks.relatedId })
      .from(caseLinks)
      .where(and(eq(caseLinks.caseId, caseId), inArray(caseLinks.relatedId, topIds))),
    db
      .select({ list: codeEntries.list, code: codeEntries.code, label: codeEntries.label })
      .from(codeEntries)
      .where(inArray(codeEntries.list, ["trigger", "cause"])),
  ]);
  return { rows, photos: photoRows, linkedIds: links.map((l) => l.relatedId), labels };
}
