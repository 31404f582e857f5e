import type { DamageFamilyInfo } from "@/lib/classification/damage-families";
import { EntryCard } from "./entry-card";
import type { RefEntry } from "./types";

/** A damage family: its ISO 15243 mode and clause where it is one, then its codes. */
export function FamilySection({ family, entries }: { family: DamageFamilyInfo; entries: RefEntry[] }) {
  return (
    <section aria-labelledby={`family-${family.code}-title`} className="scroll-mt-28" id={`family-${family.code}`}>
      <header className="mb-3 flex flex-wrap items-baseline gap-x-3 gap-y-1">
        <h3 id={`family-${family.code}-title`} className="text-base font-semibold text-ink">
          {family.label}
        </h3>
        <p className="text-xs text-muted">
          {family.isoMode ? (
            <>
              ISO 15243:2017 clause <span className="font-semibold text-ink-2">{family.isoClause}</span> · {family.isoMode}
            </>
          ) : (
            "Tearline family for findings the ISO 15243 modes do not name"
          )}
        </p>
      </header>
      <ul className="grid gap-3 sm:grid-cols-2 xl:grid-cols-3">
        {entries.map((e) => (
          <li key={e.code}>
            <EntryCard entry={e} />
          </li>
        ))}
      </ul>
    </section>
  );
}
