import "server-only";
import { asc, eq } from "drizzle-orm";
import { db } from "@/db";
import { sites, user } from "@/db/schema";

export async function listUsers() {
  return db
    .select({
      id: user.id,
      name: user.name,
      email: user.email,
      role: user.role,
      banned: user.banned,
      siteId: user.siteId,
      siteName: sites.name,
      createdAt: user.createdAt,
    })
    .from(user)
    .leftJoin(sites, eq(sites.id, user.siteId))
    .orderBy(asc(user.name));
}

export async function getUserById(id: string) {
  const [row] = await db
    .select({ id: user.id, name: user.name, email: user.email, role: user.role, siteId: user.siteId, noticePrefs: user.noticePrefs })
    .from(user)
    .where(eq(user.id, id));
  return row ?? null;
}

export async function setUserRole(id: string, role: string) {
  const rows = await db.update(user).set({ role, updatedAt: new Date() }).where(eq(user.id, id)).returning({ id: user.id });
  return rows.length > 0;
}

export async function setUserSite(id: string, siteId: string | null) {
  await db.update(user).set({ siteId, updatedAt: new Date() }).where(eq(user.id, id));
}

export async function usersWithRole(roles: string[]) {
  const all = await db
    .select({ id: user.id, email: user.email, name: user.name, role: user.role, noticePrefs: user.noticePrefs, banned: user.banned })
    .from(user);
  return all.filter((u) => roles.includes(u.role) && !u.banned);
}
