import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/card";
import { codeEntries } from "@/lib/codes/code-service";
import { requirePageUser } from "@/lib/auth/session";
import { CodeFinder } from "./_components/code-finder";
import { PartList, SeverityScale } from "./_components/scales";
import type { RefEntry } from "./_components/types";

export const metadata: Metadata = { title: "Damage codes" };
export const dynamic = "force-dynamic";

const JUMPS = [
  ["#damage", "Damage"],
  ["#causes", "Root causes"],
  ["#triggers", "Triggers"],
  ["#severity", "Severity"],
  ["#parts", "Parts"],
] as const;

export default async function ReferencePage() {
  await requirePageUser();
  const rows = await codeEntries(undefined, { includeRetired: true });
  const entries: RefEntry[] = rows.map((r) => ({
    list: r.list,
    code: r.code,
    label: r.label,
    description: r.description,
    family: r.family,
    isoMode: r.isoMode,
    synonyms: r.synonyms,
    retired: r.retiredAt !== null,
  }));

  return (
    <>
      <PageHeader
        title="Damage codes"
        subtitle="How Tearline names what a teardown finds. Codes describe what the part looks like; the cause belongs in the verdict. The first six families follow the failure modes of ISO 15243:2017."
      />
      <nav aria-label="On this page" className="mb-5 flex gap-2 overflow-x-auto pb-1 text-sm [scrollbar-width:none]">
        {JUMPS.map(([href, label]) => (
          <a
            key={href}
            href={href}
            className="shrink-0 rounded-full border border-line bg-surface px-3 py-1.5 font-medium text-ink-2 hover:border-line-strong hover:text-ink"
          >
            {label}
          </a>
        ))}
      </nav>
      <div className="flex flex-col gap-10">
        <CodeFinder entries={entries} />
        <SeverityScale />
        <PartList />
      </div>
    </>
  );
}
