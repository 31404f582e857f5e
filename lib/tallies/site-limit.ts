// Whose cases a tally counts: people who may read every site count them all; everyone else is
// held to their home shop (db/queries/tallies/scope.ts puts the same rule in the WHERE).
import { can } from "@/lib/auth/permissions";

export type TallyViewer = { id: string; role: string; siteId: string | null };

/** The site an inspector is held to, or null when the viewer reads every site. */
export function viewerSiteLimit(viewer: TallyViewer): { limited: boolean; siteId: string | null } {
  if (can(viewer.role, "tallies:read-all")) return { limited: false, siteId: null };
  return { limited: true, siteId: viewer.siteId };
}
