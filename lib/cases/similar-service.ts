// The most similar earlier cases to one case, among those the caller may read: candidates from the
// database (db/queries/similar-candidates.ts, within the read rule), ranked by the pure rules of
// lib/similarity, each with its score, reasons, whether it is linked, and a pair of photos to compare.
import "server-only";
import { similarDetails } from "@/db/queries/similar";
import { candidateIds, similarityCases, targetKeys } from "@/db/queries/similar-candidates";
import type { Case } from "@/db/schema";
import type { CurrentUser } from "@/lib/auth/session";
import { componentLabel } from "@/lib/classification/labels";
import { pickPhotoPair, partsToCompare, type PhotoPair, type PhotoRef } from "@/lib/search/photo-pair";
import { rankSimilar, type SimilarityReason } from "@/lib/similarity";
import type { Stage } from "./stages";

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

type Viewer = { id: string; role: string; siteId: string | null };

export async function findSimilarCases(caseId: string, viewer: Viewer, limit = SIMILAR_SHOWN): Promise<SimilarCaseItem[]> {
  const keys = await targetKeys(caseId);
  if (!keys) return [];
  const ids = await candidateIds(keys, viewer);
  const all = await similarityCases([caseId, ...ids]);
  const target = all.find((c) => c.id === caseId);
  if (!target) return [];
  const ranked = rankSimilar(
    target,
    all.filter((c) => c.id !== caseId),
    limit,
  );
  if (ranked.length === 0) return [];

  const details = await similarDetails(
    caseId,
    ranked.map((r) => r.candidate.id),
  );
  const byId = new Map(details.rows.map((r) => [r.id, r]));
  const label = (list: string, code: string) => details.labels.find((l) => l.list === list && l.code === code)?.label ?? code;
  const photosOf = (id: string): PhotoRef[] => details.photos.filter((p) => p.caseId === id);
  const linked = new Set(details.linkedIds);

  return ranked.flatMap(({ candidate, score, reasons }) => {
    const r = byId.get(candidate.id);
    if (!r) return [];
    const pair = pickPhotoPair(photosOf(caseId), photosOf(r.id), partsToCompare(target.findings, candidate.findings));
    return [
      {
        id: r.id,
        number: r.number,
        status: r.status,
        triggerLabel: label("trigger", r.trigger),
        causeLabel: r.primaryCause ? label("cause", r.primaryCause) : null,
        bearingClass: r.bearingClass,
        removedOn: r.removedOn,
        siteName: r.siteName,
        score,
        reasons,
        linked: linked.has(r.id),
        photoId: photosOf(r.id)[0]?.id ?? null,
        photoPair: pair ? { ...pair, componentLabel: componentLabel(pair.component) } : null,
      },
    ];
  });
}

export async function similarCases(c: Pick<Case, "id">, user: CurrentUser): Promise<SimilarCaseItem[]> {
  return findSimilarCases(c.id, user);
}
