import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader } from "@/components/ui/card";
import { codeEntries, codesWithUsage } from "@/lib/codes/code-service";
import { requirePageUser } from "@/lib/auth/session";
import { DAMAGE_FAMILIES, familyOfCode } from "@/lib/classification/damage-families";
import { CODE_LIST_LABELS, CODE_LIST_NAMES, type CodeListName } from "@/lib/validation/code-entry";
import { CodeListPanel, type CodeGroup } from "./_components/code-list-panel";
import type { CodeView } from "./_components/types";

export const metadata: Metadata = { title: "Code lists" };
export const dynamic = "force-dynamic";

const SHORT: Record<CodeListName, string> = { damage: "Damage", cause: "Causes", trigger: "Triggers" };

function groupsOf(list: CodeListName, entries: CodeView[]): CodeGroup[] {
  if (list !== "damage") return [{ key: list, title: CODE_LIST_LABELS[list].title, entries }];
  const known = DAMAGE_FAMILIES.map((f) => ({
    key: f.code,
    title: f.label,
    subtitle: f.isoMode ? `ISO 15243:2017 ${f.isoClause} ${f.isoMode}` : "Outside the ISO 15243 modes",
    entries: entries.filter((e) => (e.family ?? familyOfCode(e.code)) === f.code),
  }));
  const rest = entries.filter((e) => !DAMAGE_FAMILIES.some((f) => f.code === (e.family ?? familyOfCode(e.code))));
  return rest.length ? [...known, { key: "other", title: "Other", entries: rest }] : known;
}

export default async function CodeListsPage({ searchParams }: { searchParams: Promise<{ list?: string }> }) {
  await requirePageUser("admin:codes");
  const raw = (await searchParams).list;
  const list: CodeListName = (CODE_LIST_NAMES as readonly string[]).includes(raw ?? "") ? (raw as CodeListName) : "damage";
  const [rows, all] = await Promise.all([codesWithUsage(list), codeEntries(undefined, { includeRetired: true })]);
  const entries: CodeView[] = rows.map((r) => ({
    list: r.list,
    code: r.code,
    label: r.label,
    description: r.description,
    family: r.family,
    isoMode: r.isoMode,
    synonyms: r.synonyms,
    retired: r.retiredAt !== null,
    cases: r.cases,
  }));
  const count = (l: CodeListName) => all.filter((r) => r.list === l && !r.retiredAt).length;

  return (
    <>
      <PageHeader
        title="Code lists"
        subtitle="The words Tearline classifies with. Add codes as you need them; retire the ones you no longer want offered. A code that any case uses is never deleted."
      />
      <nav
        aria-label="Lists"
        className="mb-5 flex gap-1 overflow-x-auto rounded-xl border border-line bg-surface p-1 text-sm [scrollbar-width:none] sm:inline-flex"
      >
        {CODE_LIST_NAMES.map((l) => (
          <Link
            key={l}
            href={`/admin/codes?list=${l}`}
            aria-current={l === list ? "page" : undefined}
            className={`shrink-0 whitespace-nowrap rounded-lg px-3.5 py-2 font-medium ${l === list ? "bg-ink text-surface" : "text-ink-2 hover:bg-surface-2"}`}
          >
            <span className="sm:hidden">{SHORT[l]}</span>
            <span className="hidden sm:inline">{CODE_LIST_LABELS[l].title}</span> <span className="tabular opacity-70">{count(l)}</span>
          </Link>
        ))}
      </nav>
      <CodeListPanel list={list} groups={groupsOf(list, entries)} />
    </>
  );
}
