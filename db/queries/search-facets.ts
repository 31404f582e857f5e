// Facet counts as the sidebar shows them: labelled, selected values kept even at zero,
// most common first (stages in their own order, severity as "this bad or worse").
import "server-only";
import { bearingClassLabel, componentLabel } from "@/lib/classification/labels";
import { SEVERITIES } from "@/lib/classification/bearing-parts";
import { STAGES, STAGE_LABELS } from "@/lib/cases/stages";
import type { SearchParams } from "@/lib/search/query-schema";
import type { SearchLookups } from "./search-lookups";
import type { FacetKey } from "./search-sql";

export interface FacetValue {
  readonly value: string;
  readonly label: string;
  readonly count: number;
  readonly selected: boolean;
}

type FacetRow = { facet: string; value: string | null; n: number };

// Short enough for the sidebar; the full wording of the 0–4 scale is on the case page.
const SEVERITY_SHORT: Record<number, string> = {
  4: "4 · bearing condemned",
  3: "3+ · part condemned",
  2: "2+ · minor or worse",
  1: "1+ · any damage",
};

const FACETS: FacetKey[] = ["status", "trigger", "cause", "code", "component", "class", "site", "severity"];

function byCount(values: FacetValue[]): FacetValue[] {
  return values.sort((a, b) => b.count - a.count || a.label.localeCompare(b.label));
}

export function labelFacets(rows: readonly FacetRow[], p: SearchParams, lookups: SearchLookups): Record<FacetKey, FacetValue[]> {
  const siteById = new Map(lookups.sites.map((s) => [s.id, s]));
  const counts = (facet: FacetKey) => {
    const m = new Map<string, number>();
    for (const r of rows) if (r.facet === facet && r.value !== null && r.value !== "") m.set(r.value, r.n);
    return m;
  };
  const list = (facet: Exclude<FacetKey, "severity" | "site">, label: (v: string) => string): FacetValue[] => {
    const c = counts(facet);
    const selected = p[facet] as string[];
    for (const v of selected) if (!c.has(v)) c.set(v, 0);
    return [...c].map(([value, count]) => ({ value, label: label(value), count, selected: selected.includes(value) }));
  };

  const siteCounts = new Map<string, number>();
  for (const [id, n] of counts("site")) {
    const s = siteById.get(id);
    if (s) siteCounts.set(s.code, n);
  }
  for (const code of p.site) if (!siteCounts.has(code)) siteCounts.set(code, 0);
  const siteName = (code: string) => lookups.sites.find((s) => s.code === code)?.name ?? code;

  // Counts per worst finding, summed into "at least this severe".
  const perLevel = counts("severity");
  const atLeast = (k: number) => [...perLevel].filter(([v]) => Number(v) >= k).reduce((n, [, c]) => n + c, 0);

  const out = {
    status: list("status", (v) => STAGE_LABELS[v as keyof typeof STAGE_LABELS] ?? v).sort(
      (a, b) => STAGES.indexOf(a.value as never) - STAGES.indexOf(b.value as never),
    ),
    trigger: byCount(list("trigger", (v) => lookups.labels.trigger.get(v) ?? v)),
    cause: byCount(list("cause", (v) => lookups.labels.cause.get(v) ?? v)),
    code: byCount(list("code", (v) => lookups.labels.damage.get(v) ?? v)),
    component: byCount(list("component", (v) => componentLabel(v))),
    class: byCount(list("class", (v) => bearingClassLabel(v))),
    site: byCount([...siteCounts].map(([value, count]) => ({ value, label: siteName(value), count, selected: p.site.includes(value) }))),
    severity: SEVERITIES.filter((s) => s.code > 0)
      .map((s) => ({
        value: String(s.code),
        label: SEVERITY_SHORT[s.code] ?? `${s.code} or worse`,
        count: atLeast(s.code),
        selected: p.severity === s.code,
      }))
      .reverse(),
  } satisfies Record<FacetKey, FacetValue[]>;
  return Object.fromEntries(FACETS.map((f) => [f, out[f]])) as Record<FacetKey, FacetValue[]>;
}
