// Who can receive a notice, and each person's notice switches.
import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import { db } from "@/db";
import { codeEntries, user } from "@/db/schema";
import type { CodeListName } from "@/db/schema";
import type { NoticeCandidate, NoticePrefs } from "@/lib/notify/notice-kinds";

const candidateColumns = {
  id: user.id,
  email: user.email,
  name: user.name,
  role: user.role,
  noticePrefs: user.noticePrefs,
  banned: user.banned,
};
export type NoticePerson = NoticeCandidate & { name: string };

export async function peopleWithRoles(roles: string[]): Promise<NoticePerson[]> {
  if (roles.length === 0) return [];
  return db.select(candidateColumns).from(user).where(inArray(user.role, roles));
}

export async function peopleByIds(ids: Array<string | null | undefined>): Promise<NoticePerson[]> {
  const wanted = [...new Set(ids.filter((x): x is string => Boolean(x)))];
  if (wanted.length === 0) return [];
  return db.select(candidateColumns).from(user).where(inArray(user.id, wanted));
}

export async function getNoticePrefs(userId: string): Promise<NoticePrefs> {
  const [row] = await db.select({ prefs: user.noticePrefs }).from(user).where(eq(user.id, userId));
  return row?.prefs ?? {};
}

export async function saveNoticePrefs(userId: string, prefs: NoticePrefs): Promise<void> {
  await db.update(user).set({ noticePrefs: prefs, updatedAt: new Date() }).where(eq(user.id, userId));
}

/** The label an admin gave a code (retired codes included), or undefined when the list has none. */
export async function codeLabel(list: CodeListName, code: string | null | undefined): Promise<string | undefined> {
  if (!code) return undefined;
  const [row] = await db
    .select({ label: codeEntries.label })
    .from(codeEntries)
    .where(and(eq(codeEntries.list, list), eq(codeEntries.code, code)));
  return row?.label;
}
