// A person's own notice switches: read and changed by that person only (the id comes from the
// session, never from a request body).
import "server-only";
import { getNoticePrefs, saveNoticePrefs } from "@/db/queries/notices";
import { mergeNoticePrefs, type NoticeKind } from "./notice-kinds";

export async function noticePrefsOf(userId: string) {
  return getNoticePrefs(userId);
}

/** Applies the switches named in the change and stores the result; returns the stored switches. */
export async function switchNotices(userId: string, change: Partial<Record<NoticeKind, boolean>>) {
  const prefs = mergeNoticePrefs(await getNoticePrefs(userId), change);
  await saveNoticePrefs(userId, prefs);
  return prefs;
}
