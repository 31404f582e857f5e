// GET /api/me/notices - my notice switches; PATCH - turn some of my notices on or off
import { NextResponse } from "next/server";
import { z } from "@/lib/validation/zod";
import { noticePrefsOf, switchNotices } from "@/lib/notify/notice-service";
import { parseJson, withRole } from "@/lib/http/handler";
import { NOTICE_KIND_CODES, noticeKindsFor, type NoticeKind } from "@/lib/notify/notice-kinds";

const switchValue = z.boolean({ message: "Each notice is switched with true (on) or false (off)." }).optional();
const changeSchema = z
  .strictObject(Object.fromEntries(NOTICE_KIND_CODES.map((k) => [k, switchValue])) as Record<NoticeKind, typeof switchValue>, {
    message: `Unknown notice; the notices are ${NOTICE_KIND_CODES.join(", ")}.`,
  })
  .refine((o) => Object.keys(o).length > 0, "Name at least one notice to switch.");

function view(role: string, prefs: Record<string, boolean>) {
  return noticeKindsFor(role).map((k) => ({ kind: k.kind, label: k.label, description: k.description, on: prefs[k.kind] !== false }));
}

// Any signed-in person, and only their own switches: the id comes from the session, never the body.
export const GET = withRole(null, async ({ user }) => NextResponse.json({ notices: view(user.role, await noticePrefsOf(user.id)) }));

export const PATCH = withRole(null, async ({ req, user }) => {
  const change = await parseJson(req, changeSchema);
  const prefs = await switchNotices(user.id, change);
  return NextResponse.json({ notices: view(user.role, prefs), prefs });
});
