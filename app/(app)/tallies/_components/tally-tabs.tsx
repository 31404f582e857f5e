// Overview, Life and Removal yield share the filters; switching tabs keeps them.
import Link from "next/link";

export function TallyTabs({ active, query }: { active: "overview" | "life" | "yield"; query: string }) {
  const tabs = [
    { id: "overview", label: "Overview", href: `/tallies${query ? `?${query}` : ""}` },
    { id: "life", label: "Life (Weibull)", href: `/tallies/life${query ? `?${query}` : ""}` },
    { id: "yield", label: "Removal yield", href: `/tallies/yield${query ? `?${query}` : ""}` },
  ] as const;
  return (
    <nav aria-label="Tallies sections" className="mb-4 flex gap-1 overflow-x-auto border-b border-line">
      {tabs.map((t) => (
        <Link
          key={t.id}
          href={t.href}
          aria-current={active === t.id ? "page" : undefined}
          className={`-mb-px inline-flex h-11 shrink-0 items-center border-b-2 px-4 text-sm font-medium ${active === t.id ? "border-accent text-ink" : "border-transparent text-muted hover:text-ink"}`}
        >
          {t.label}
        </Link>
      ))}
    </nav>
  );
}
