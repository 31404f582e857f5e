// The most similar earlier cases to one case, among those the caller may read.
import "server-only";
import { findSimilarCases } from "@/db/queries/similar";
import type { Case } from "@/db/schema";
import type { CurrentUser } from "@/lib/auth/session";
import type { SimilarCaseItem } from "./types";

export async function similarCases(c: Pick<Case, "id">, user: CurrentUser): Promise<SimilarCaseItem[]> {
  return findSimilarCases(c.id, user);
}
