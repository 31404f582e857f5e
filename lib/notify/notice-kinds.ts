// The e-mail notices Tearline sends, as data: who each one is for and how a person turns it off.
import type { Role } from "@/lib/auth/permissions";

export const NOTICE_KIND_CODES = ["signoff-requested", "verdict-signed", "verdict-returned", "case-reopened", "digest"] as const;
export type NoticeKind = (typeof NOTICE_KIND_CODES)[number];

export type NoticeKindInfo = {
  kind: NoticeKind;
  label: string;
  description: string;
  /** Roles that can receive it; the switch shows only to them. */
  roles: readonly Role[];
};

export const NOTICE_KINDS: readonly NoticeKindInfo[] = [
  {
    kind: "signoff-requested",
    label: "Verdict waiting for sign-off",
    description: "An analyst proposed a root cause and the case waits for an engineer to sign or return it.",
    roles: ["engineer"],
  },
  {
    kind: "verdict-signed",
    label: "Verdict signed",
    description: "A case you filed or a verdict you proposed was signed by an engineer.",
    roles: ["inspector", "analyst", "admin"],
  },
  {
    kind: "verdict-returned",
    label: "Verdict returned to the bench",
    description: "An engineer sent a proposed verdict back, with the reason, for more work.",
    roles: ["inspector", "analyst", "admin"],
  },
  {
    kind: "case-reopened",
    label: "Signed case reopened",
    description: "A signed case you filed, proposed or signed was reopened, with the reason.",
    roles: ["inspector", "analyst", "engineer", "admin"],
  },
  {
    kind: "digest",
    label: "Weekly digest",
    description: "Monday's summary: new removals, signed verdicts, the leading causes and what waits for sign-off.",
    roles: ["analyst", "engineer", "manager", "admin"],
  },
];

export function noticeKindInfo(kind: NoticeKind): NoticeKindInfo {
  return NOTICE_KINDS.find((k) => k.kind === kind)!;
}

export function isNoticeKind(value: unknown): value is NoticeKind {
  return typeof value === "string" && (NOTICE_KIND_CODES as readonly string[]).includes(value);
}

/** The notices whose switch a person with this role sees. */
export function noticeKindsFor(role: string): NoticeKindInfo[] {
  return NOTICE_KINDS.filter((k) => (k.roles as readonly string[]).includes(role));
}

export type NoticePrefs = Record<string, boolean>;

/** A notice is on unless the person switched it off; a kind not meant for the role is never sent. */
export function wantsNotice(person: { role: string; noticePrefs: NoticePrefs | null | undefined }, kind: NoticeKind): boolean {
  if (!(noticeKindInfo(kind).roles as readonly string[]).includes(person.role)) return false;
  return person.noticePrefs?.[kind] !== false;
}

export type NoticeCandidate = { id: string; email: string; role: string; noticePrefs: NoticePrefs | null; banned?: boolean | null };

/**
 * E-mail addresses that should receive a notice: people who want it, not banned, not the person
 * whose action caused it (they know already), each address once.
 */
export function pickRecipients(candidates: readonly NoticeCandidate[], kind: NoticeKind, actorId?: string | null): string[] {
  const out = new Set<string>();
  for (const c of candidates) {
    if (c.banned || c.id === actorId || !c.email) continue;
    if (wantsNotice(c, kind)) out.add(c.email);
  }
  return [...out];
}

/** Merges a partial change into stored prefs, keeping only known kinds. */
export function mergeNoticePrefs(stored: NoticePrefs | null | undefined, change: Partial<Record<NoticeKind, boolean>>): NoticePrefs {
  const merged: NoticePrefs = {};
  for (const kind of NOTICE_KIND_CODES) {
    const value = change[kind] ?? stored?.[kind];
    if (typeof value === "boolean") merged[kind] = value;
  }
  return merged;
}
