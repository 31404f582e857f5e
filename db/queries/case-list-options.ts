// The choices the case list's filter bar offers: sites, and the trigger and cause lists as the
// admins keep them (retired codes stay, marked, because old cases still carry them).
import "server-only";
import { asc, eq } from "drizzle-orm";
import { db } from "@/db";
import { codeEntries, sites } from "@/db/schema";

export type FilterOption = { code: string; label: string; retired?: boolean };
export type CaseListOptions = { sites: FilterOption[]; triggers: FilterOption[]; causes: FilterOption[] };

async function codeList(list: "trigger" | "cause"): Promise<FilterOption[]> {
  const rows = await db
    .select({ code: codeEntries.code, label: codeEntries.label, retiredAt: codeEntries.retiredAt })
    .from(codeEntries)
    .where(eq(codeEntries.list, list))
    .orderBy(asc(codeEntries.sortOrder), asc(codeEntries.label));
  return rows.map((r) => ({ code: r.code, label: r.label, ...(r.retiredAt ? { retired: true } : {}) }));
}

export async function caseListOptions(): Promise<CaseListOptions> {
  const [siteRows, triggers, causes] = await Promise.all([
    db.select({ code: sites.code, label: sites.name, active: sites.active }).from(sites).orderBy(asc(sites.name)),
    codeList("trigger"),
    codeList("cause"),
  ]);
  return { sites: siteRows.map((s) => ({ code: s.code, label: s.label, ...(s.active ? {} : { retired: true }) })), triggers, causes };
}
