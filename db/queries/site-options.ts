import "server-only";
import { asc, eq } from "drizzle-orm";
import { db } from "@/db";
import { sites } from "@/db/schema";

/** Active sites with their end-play policy, for forms. */
export async function siteOptions() {
  const rows = await db.select().from(sites).where(eq(sites.active, true)).orderBy(asc(sites.name));
  return rows.map((s) => ({
    id: s.id,
    name: s.name,
    kind: s.kind,
    policy: { maxIn: s.endPlayMaxIn, dialSpreadIn: s.dialSpreadIn, tapeSpreadIn: s.tapeSpreadIn, plausibleMaxIn: s.plausibleMaxIn },
  }));
}
