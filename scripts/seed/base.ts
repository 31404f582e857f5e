// Sites, people and the classification lists: what every demo and test database starts with.
import { randomUUID } from "node:crypto";
import { hashPassword } from "better-auth/crypto";
import { sql } from "drizzle-orm";
import type { Db } from "../../db";
import { account, codeEntries, sites, user } from "../../db/schema";
import { DAMAGE_CODES, ROOT_CAUSES, TRIGGERS } from "../../lib/classification";
import { DEMO_PASSWORD, DEMO_SITES, DEMO_USERS } from "./demo-people";

export async function seedCodeLists(db: Db) {
  const rows = [
    ...DAMAGE_CODES.map((d, i) => ({
      list: "damage" as const,
      code: d.code,
      label: d.label,
      description: d.looksLike,
      family: d.family,
      isoMode: d.isoMode,
      synonyms: [...d.synonyms],
      sortOrder: i,
    })),
    ...ROOT_CAUSES.map((c, i) => ({
      list: "cause" as const,
      code: c.code,
      label: c.label,
      description: c.description,
      synonyms: [],
      sortOrder: i,
    })),
    ...TRIGGERS.map((t, i) => ({
      list: "trigger" as const,
      code: t.code,
      label: t.label,
      description: t.description,
      synonyms: [],
      sortOrder: i,
    })),
  ];
  await db.insert(codeEntries).values(rows).onConflictDoNothing();
}

export async function seedSitesAndPeople(db: Db) {
  const siteRows = await db
    .insert(sites)
    .values(DEMO_SITES.map((s) => ({ ...s })))
    .onConflictDoNothing()
    .returning();
  const all = siteRows.length ? siteRows : await db.select().from(sites);
  const siteId = (code: string | null) => (code ? (all.find((s) => s.code === code)?.id ?? null) : null);
  const hash = await hashPassword(DEMO_PASSWORD);
  for (const u of DEMO_USERS) {
    const id = randomUUID();
    const inserted = await db
      .insert(user)
      .values({ id, name: u.name, email: u.email, emailVerified: true, role: u.role, siteId: siteId(u.site) })
      .onConflictDoNothing()
      .returning({ id: user.id });
    if (inserted.length) {
      await db.insert(account).values({ id: randomUUID(), accountId: id, providerId: "credential", userId: id, password: hash });
    }
  }
}

export async function resetAll(db: Db) {
  await db.execute(
    sql`TRUNCATE TABLE case_links, case_events, photos, findings, cases, case_counters, mail_outbox, invitations, session, account, verification, "user", code_entries, sites RESTART IDENTITY CASCADE`,
  );
}
