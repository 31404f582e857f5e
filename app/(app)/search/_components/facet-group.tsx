// One facet: each value a link that adds it to or takes it from the search, with how many
// cases it would show. Values within a facet widen the search (either one); facets narrow it.
import Link from "next/link";
import type { FacetValue } from "@/lib/search/search-service";
import type { MultiFacet, SearchParams } from "@/lib/search/query-schema";
import { searchHref, toggleValue, withChange } from "@/lib/search/url-state";

const SHOWN = 6;

function Check({ on, round }: { on: boolean; round?: boolean }) {
  return (
    <span
      aria-hidden
      className={`grid h-4 w-4 shrink-0 place-items-center border ${round ? "rounded-full" : "rounded"} ${on ? "border-accent bg-accent text-accent-ink" : "border-line-strong bg-surface"}`}
    >
      {on ? (
        <svg viewBox="0 0 24 24" className="h-3 w-3" fill="none" stroke="currentColor" strokeWidth="3">
          <path d="M5 12l5 5 9-10" />
        </svg>
      ) : null}
    </span>
  );
}

function ValueLink({ href, value, round }: { href: string; value: FacetValue; round?: boolean }) {
  return (
    <li>
      <Link
        href={href}
        scroll={false}
        aria-current={value.selected ? "true" : undefined}
        data-testid="facet-value"
        className={`flex min-h-10 items-center gap-2.5 rounded-md px-2 py-1.5 text-sm hover:bg-surface-2 lg:min-h-8 ${value.selected ? "font-medium text-ink" : "text-ink-2"}`}
      >
        <Check on={value.selected} round={round} />
        <span className="min-w-0 flex-1 truncate" title={value.label}>
          {value.label}
        </span>
        <span className="text-xs tabular text-muted">{value.count.toLocaleString("en-US")}</span>
      </Link>
    </li>
  );
}

function Group({ title, children, count }: { title: string; children: React.ReactNode; count?: number }) {
  return (
    <section className="border-b border-line py-3 last:border-b-0">
      <h3 className="mb-1 flex items-center justify-between px-2 text-xs font-semibold uppercase tracking-wide text-muted">
        {title}
        {count ? <span className="rounded-full bg-accent-soft px-1.5 text-[11px] text-accent">{count}</span> : null}
      </h3>
      {children}
    </section>
  );
}

export function FacetGroup({
  title,
  facet,
  values,
  params,
}: {
  title: string;
  facet: MultiFacet;
  values: FacetValue[];
  params: SearchParams;
}) {
  if (values.length === 0) return null;
  const link = (v: FacetValue) => <ValueLink key={v.value} value={v} href={searchHref(toggleValue(params, facet, v.value))} />;
  const first = values.slice(0, SHOWN),
    rest = values.slice(SHOWN);
  const restSelected = rest.some((v) => v.selected);
  return (
    <Group title={title} count={params[facet].length}>
      <ul>{first.map(link)}</ul>
      {rest.length ? (
        <details open={restSelected} className="group">
          <summary className="cursor-pointer list-none px-2 py-1 text-sm text-accent hover:underline [&::-webkit-details-marker]:hidden">
            <span className="group-open:hidden">{rest.length} more</span>
            <span className="hidden group-open:inline">Fewer</span>
          </summary>
          <ul>{rest.map(link)}</ul>
        </details>
      ) : null}
    </Group>
  );
}

/** Worst finding at least this severe: one choice at a time. */
export function SeverityGroup({ values, params }: { values: FacetValue[]; params: SearchParams }) {
  return (
    <Group title="Worst finding" count={params.severity !== undefined ? 1 : 0}>
      <ul>
        {values.map((v) => (
          <ValueLink
            key={v.value}
            round
            value={v}
            href={searchHref(withChange(params, { severity: v.selected ? undefined : Number(v.value) }))}
          />
        ))}
      </ul>
    </Group>
  );
}

export { Group as FacetSection };
