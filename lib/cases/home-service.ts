// The home page's counts and short lists, among the cases the viewer may read.
import "server-only";
import { caseCards, stageCounts } from "@/db/queries/home";
import type { CurrentUser } from "@/lib/auth/session";
import type { Stage } from "./stages";
import type { CaseCard } from "./types";

export async function homeStageCounts(user: CurrentUser): Promise<Record<Stage, number>> {
  return stageCounts(user);
}

/** The newest-updated cases, in the given stages when named. */
export async function homeCaseCards(user: CurrentUser, stages?: Stage[]): Promise<CaseCard[]> {
  return caseCards(user, stages);
}
