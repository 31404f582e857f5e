// Which cases a person may see: inspectors their own shop's and their own; every other role all.
import { can } from "@/lib/auth/permissions";

type Viewer = { id: string; role: string; siteId: string | null };
type CaseScope = { createdBy: string | null; siteId: string | null };

export function canReadCase(viewer: Viewer, c: CaseScope): boolean {
  if (can(viewer.role, "case:read-all")) return true;
  if (!can(viewer.role, "case:read")) return false;
  return c.createdBy === viewer.id || (viewer.siteId !== null && c.siteId === viewer.siteId);
}
