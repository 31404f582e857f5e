// The most similar earlier cases to one case, each with its score, the reasons it matched,
// whether it is already linked, and a pair of photos of the same part to compare.
import "server-only";
import { componentLabel } from "@/lib/classification/labels";
import { and, asc, eq, inArray } from "drizzle-orm";
import { db } from "@/db";
import { caseLinks, cases, codeEntries, photos, sites } from "@/db/schema";
import type { Stage } from "@/lib/cases/stages";
import { pickPhotoPair, partsToCompare, type PhotoPair, type PhotoRef } from "@/lib/search/photo-pair";
import { rankSimilar, type SimilarityReason } from "@/lib/similarity";
import { candidateIds, similarityCases, targetKeys } from "./similar-candidates";
import type { SearchViewer } from "./search-sql";

export const SIMILAR_SHOWN = 10;

export interface SimilarCaseItem {
  readonly id: string;
  readonly number: string;
  readonly status: Stage;
  readonly triggerLabel: string;
  readonly causeLabel: string | null;
  readonly bearingClass: string;
  readonly removedOn: string | null;
  readonly siteName: string | null;
  readonly score: number;
  readonly reasons: SimilarityReason[];
  readonly linked: boolean;
  /** First photo of the similar case, for a thumbnail. */
  readonly photoId: string | null;
  readonly photoPair: (PhotoPair & { componentLabel: string }) | null;
}


export async function findSimilarCases(caseId: string, viewer: SearchViewer, limit = SIMILAR_SHOWN): Promise<SimilarCaseItem[]> {
  const keys = await targetKeys(caseId);
  if (!keys) return [];
  const ids = await candidateIds(keys, viewer);
  const [target, ...candidates] = await similarityCases([caseId, ...ids]).then((all) => {
    const t = all.find((c) => c.id === caseId)!;
    return [t, ...all.filter((c) => c.id !== caseId)];
  });
  const ranked = rankSimilar(target, candidates, limit);
  if (ranked.length === 0) return [];

  const topIds = ranked.map((r) => r.candidate.id);
  const [rows, photoRows, links, labels] = await Promise.all([
    db
      .select({ id: cases.id, number: cases.number, status: cases.status, trigger: cases.trigger, primaryCause: cases.primaryCause, bearingClass: cases.bearingClass, removedOn: cases.removedOn, siteName: sites.name })
      .from(cases).leftJoin(sites, eq(sites.id, cases.siteId)).where(inArray(cases.id, topIds)),
    db
      .select({ id: photos.id, caseId: photos.caseId, component: photos.component })
      .from(photos).where(inArray(photos.caseId, [caseId, ...topIds])).orderBy(asc(photos.createdAt), asc(photos.id)),
    db.select({ relatedId: caseLinks.relatedId }).from(caseLinks).where(and(eq(caseLinks.caseId, caseId), inArray(caseLinks.relatedId, topIds))),
    db.select({ list: codeEntries.list, code: codeEntries.code, label: codeEntries.label }).from(codeEntries).where(inArray(codeEntries.list, ["trigger", "cause"])),
  ]);
  const byId = new Map(rows.map((r) => [r.id, r]));
  const label = (list: string, code: string) => labels.find((l) => l.list === list && l.code === code)?.label ?? code;
  const photosOf = (id: string): PhotoRef[] => photoRows.filter((p) => p.caseId === id);
  const linked = new Set(links.map((l) => l.relatedId));

  return ranked.flatMap(({ candidate, score, reasons }) => {
    const r = byId.get(candidate.id);
    if (!r) return [];
    const pair = pickPhotoPair(photosOf(caseId), photosOf(r.id), partsToCompare(target.findings, candidate.findings));
    return [{
      id: r.id, number: r.number, status: r.status, triggerLabel: label("trigger", r.trigger),
      causeLabel: r.primaryCause ? label("cause", r.primaryCause) : null, bearingClass: r.bearingClass,
      removedOn: r.removedOn, siteName: r.siteName, score, reasons, linked: linked.has(r.id),
      photoId: photosOf(r.id)[0]?.id ?? null,
      photoPair: pair ? { ...pair, componentLabel: componentLabel(pair.component) } : null,
    }];
  });
}
