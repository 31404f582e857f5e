// Finds the sites and people the seeded cases are filed under.
import { inArray } from "drizzle-orm";
import type { Db } from "../../db";
import { sites, user } from "../../db/schema";
import type { SeedContext, SiteRef } from "./case-builder";
import { DEMO_USERS } from "./demo-people";

function email(role: string, site?: string): string {
  const found = DEMO_USERS.find((u) => u.role === role && (site === undefined || u.site === site));
  if (!found) throw new Error(`no demo ${role}${site ? ` at ${site}` : ""}`);
  return found.email;
}

export async function loadSeedContext(db: Db): Promise<SeedContext> {
  const rows = await db
    .select()
    .from(sites)
    .where(inArray(sites.code, ["MJC", "PYC", "OSW", "CFL"]));
  const site = (code: string): SiteRef => {
    const s = rows.find((r) => r.code === code);
    if (!s) throw new Error(`site ${code} is missing: load the demo sites first (npm run seed:demo)`);
    return { id: s.id, policy: { maxIn: s.endPlayMaxIn, dialSpreadIn: s.dialSpreadIn, tapeSpreadIn: s.tapeSpreadIn } };
  };
  const people = await db.select({ id: user.id, email: user.email }).from(user);
  const id = async (address: string) => {
    const p = people.find((u) => u.email === address);
    if (!p) throw new Error(`user ${address} is missing: load the demo people first (npm run seed:demo)`);
    return p.id;
  };
  const analyst = await id(email("analyst"));
  return {
    sites: { MJC: site("MJC"), PYC: site("PYC"), OSW: site("OSW") },
    labId: site("CFL").id,
    // Osier has no inspector of its own in the demo; the lab files its removals.
    filer: { MJC: await id(email("inspector", "MJC")), PYC: await id(email("inspector", "PYC")), OSW: analyst },
    analyst,
    engineer: await id(email("engineer")),
  };
}
