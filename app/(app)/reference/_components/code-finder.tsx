"use client";
import { useMemo, useState } from "react";
import { EmptyState } from "@/components/ui/card";
import { createCodeSearch } from "@/lib/classification/code-search";
import { DAMAGE_FAMILIES, familyOfCode } from "@/lib/classification/damage-families";
import { EntryCard } from "./entry-card";
import { FamilySection } from "./family-section";
import { SimpleList } from "./simple-list";
import type { RefEntry } from "./types";

const OTHER_FAMILY = { code: "other", label: "Other", isoMode: null, isoClause: null };

/** Search over every list, or browse damage by family, causes and triggers; retired codes on request. */
export function CodeFinder({ entries }: { entries: RefEntry[] }) {
  const [query, setQuery] = useState("");
  const [showRetired, setShowRetired] = useState(false);
  const search = useMemo(() => createCodeSearch(entries), [entries]);
  const retiredCount = entries.filter((e) => e.retired).length;
  const visible = entries.filter((e) => showRetired || !e.retired);
  const hits = query.trim() ? search(query, { includeRetired: showRetired, limit: 24 }) : null;
  const damage = visible.filter((e) => e.list === "damage");
  const familyOf = (e: RefEntry) => e.family ?? familyOfCode(e.code);
  const families = [...DAMAGE_FAMILIES, OTHER_FAMILY].map((f) => ({
    family: f,
    entries: damage.filter((e) => (f.code === "other" ? !DAMAGE_FAMILIES.some((k) => k.code === familyOf(e)) : familyOf(e) === f.code)),
  }));

  return (
    <div className="flex flex-col gap-6">
      <div className="flex flex-col gap-3 rounded-xl border border-line bg-surface p-3 sm:flex-row sm:items-center sm:p-4">
        <label className="relative flex-1">
          <span className="sr-only">Search the codes</span>
          <svg
            viewBox="0 0 24 24"
            className="pointer-events-none absolute left-3 top-1/2 h-5 w-5 -translate-y-1/2 text-muted"
            fill="none"
            stroke="currentColor"
            strokeWidth="1.8"
            aria-hidden
          >
            <path d="M11 18a7 7 0 100-14 7 7 0 000 14zM20 20l-4-4" />
          </svg>
          <input
            type="search"
            value={query}
            onChange={(e) => setQuery(e.target.value)}
            placeholder="Type what you see: rust, flaking, blue, loose cap screw…"
            className="h-12 w-full rounded-lg border border-line-strong bg-surface pl-10 pr-3 text-base text-ink placeholder:text-muted focus:border-transparent focus:outline-2 focus:outline-accent"
            aria-describedby="finder-hint"
          />
        </label>
        {retiredCount ? (
          <label className="flex shrink-0 cursor-pointer items-center gap-2 text-sm text-ink-2">
            <input
              type="checkbox"
              checked={showRetired}
              onChange={(e) => setShowRetired(e.target.checked)}
              className="h-5 w-5 accent-[var(--accent)]"
            />
            Show retired ({retiredCount})
          </label>
        ) : null}
      </div>
      <p id="finder-hint" className="-mt-4 text-xs text-muted">
        Shop words and small typos are fine: search looks at codes, names, descriptions and the words people use on the floor.
      </p>

      {hits ? (
        <section aria-label="Search results" aria-live="polite">
          <p className="mb-3 text-sm text-muted">
            {hits.length ? `${hits.length} ${hits.length === 1 ? "match" : "matches"}, best first` : ""}
          </p>
          {hits.length ? (
            <ul className="grid gap-3 sm:grid-cols-2 xl:grid-cols-3">
              {hits.map((h) => (
                <li key={`${h.entry.list}-${h.entry.code}`}>
                  <EntryCard entry={h.entry} showList matched={h.matchedOn === "synonym" ? h.matchedText : undefined} />
                </li>
              ))}
            </ul>
          ) : (
            <EmptyState title={`Nothing matches “${query.trim()}”`}>
              Try a plainer word for what the part shows, or browse the families below after clearing the search.
            </EmptyState>
          )}
        </section>
      ) : (
        <>
          <section id="damage" aria-labelledby="damage-title" className="flex scroll-mt-28 flex-col gap-6">
            <div>
              <h2 id="damage-title" className="text-lg font-semibold text-ink">
                Damage codes by family
              </h2>
              <ul className="mt-2 flex flex-wrap gap-1.5 text-xs" aria-label="Families">
                {families
                  .filter((f) => f.entries.length)
                  .map((f) => (
                    <li key={f.family.code}>
                      <a
                        href={`#family-${f.family.code}`}
                        className="inline-flex items-center gap-1 rounded-md bg-surface px-2 py-1 font-medium text-ink-2 ring-1 ring-line hover:text-ink hover:ring-line-strong"
                      >
                        {f.family.label}
                        {f.family.isoClause ? <span className="text-muted tabular">{f.family.isoClause}</span> : null}
                      </a>
                    </li>
                  ))}
              </ul>
            </div>
            {families
              .filter((f) => f.entries.length)
              .map((f) => (
                <FamilySection key={f.family.code} family={f.family} entries={f.entries} />
              ))}
          </section>
          <SimpleList
            id="causes"
            title="Root causes"
            intro="Why a bearing came to need removal, chosen in the verdict. One primary cause, any number contributing."
            entries={visible.filter((e) => e.list === "cause")}
          />
          <SimpleList
            id="triggers"
            title="Removal triggers"
            intro="What brought the bearing out of service, recorded on the field report."
            entries={visible.filter((e) => e.list === "trigger")}
          />
        </>
      )}
    </div>
  );
}
