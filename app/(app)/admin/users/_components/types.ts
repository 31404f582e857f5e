// Shapes the People page hands from the server to its client pieces.
export type SiteChoice = { id: string; code: string; name: string; kind: string; active: boolean };

export type Person = {
  id: string;
  name: string;
  email: string;
  role: string;
  banned: boolean | null;
  siteId: string | null;
  locked?: boolean;
};

export type PendingInvitation = {
  id: string;
  email: string;
  name: string;
  role: string;
  siteId: string | null;
  expiresAt: string;
  createdAt: string;
};

/** Active sites, plus the one already chosen even if it has since been closed. */
export function siteOptions(sites: SiteChoice[], current: string | null) {
  return sites.filter((s) => s.active || s.id === current);
}

/** The people table's columns on wider screens (header and rows share them). */
export const PEOPLE_COLUMNS = "md:grid-cols-[minmax(0,1.3fr)_minmax(0,1fr)_minmax(0,1.3fr)_7.5rem]";
