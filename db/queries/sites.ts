// Sites and their end-play policy; a site that cases, people or invitations point at is never deleted.
import "server-only";
import { asc, count, eq, isNull, ne, or } from "drizzle-orm";
import { db } from "@/db";
import { cases, invitations, sites, user } from "@/db/schema";

export async function listSites() {
  return db.select().from(sites).orderBy(asc(sites.code));
}

/** What forms need for a site picker. */
export async function listSiteChoices() {
  return db
    .select({ id: sites.id, code: sites.code, name: sites.name, kind: sites.kind, active: sites.active })
    .from(sites)
    .orderBy(asc(sites.name));
}

export async function getSite(id: string) {
  const [row] = await db.select().from(sites).where(eq(sites.id, id));
  return row ?? null;
}

export async function findSiteByCode(code: string) {
  const [row] = await db.select({ id: sites.id }).from(sites).where(eq(sites.code, code));
  return row ?? null;
}

export async function insertSite(values: typeof sites.$inferInsert) {
  const [row] = await db.insert(sites).values(values).returning();
  return row;
}

export async function updateSite(id: string, values: Partial<typeof sites.$inferInsert>) {
  const [row] = await db
    .update(sites)
    .set({ ...values, updatedAt: new Date() })
    .where(eq(sites.id, id))
    .returning();
  return row ?? null;
}

/** How many records point at a site: any of them keeps it from being deleted. */
export async function siteUsage(id: string) {
  const [[c], [u], [i]] = await Promise.all([
    db
      .select({ n: count() })
      .from(cases)
      .where(or(eq(cases.siteId, id), eq(cases.labSiteId, id))),
    db.select({ n: count() }).from(user).where(eq(user.siteId, id)),
    db.select({ n: count() }).from(invitations).where(eq(invitations.siteId, id)),
  ]);
  return { cases: c.n, users: u.n, invitations: i.n };
}

/** Per-site counts of cases (removed or torn down there) and people, for the admin list. */
export async function siteUsageCounts() {
  const [removed, tornDown, userRows] = await Promise.all([
    db.select({ siteId: cases.siteId, n: count() }).from(cases).groupBy(cases.siteId),
    db
      .select({ siteId: cases.labSiteId, n: count() })
      .from(cases)
      .where(or(isNull(cases.siteId), ne(cases.labSiteId, cases.siteId)))
      .groupBy(cases.labSiteId),
    db.select({ siteId: user.siteId, n: count() }).from(user).groupBy(user.siteId),
  ]);
  const out = new Map<string, { cases: number; users: number }>();
  const entry = (id: string) => out.get(id) ?? out.set(id, { cases: 0, users: 0 }).get(id)!;
  for (const r of [...removed, ...tornDown]) if (r.siteId) entry(r.siteId).cases += r.n;
  for (const r of userRows) if (r.siteId) entry(r.siteId).users += r.n;
  return out;
}

export async function deleteSite(id: string) {
  const rows = await db.delete(sites).where(eq(sites.id, id)).returning({ id: sites.id });
  return rows.length > 0;
}
