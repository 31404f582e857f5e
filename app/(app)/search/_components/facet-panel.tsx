// All the filters beside the results: stage, trigger, cause, damage, part, class, site,
// worst finding and removal dates, each with counts for the current search.
import type { SearchResult } from "@/lib/search/search-service";
import type { CodeSearchEntry } from "@/lib/classification/code-search";
import type { SearchParams } from "@/lib/search/query-schema";
import { searchHref, toggleValue } from "@/lib/search/url-state";
import { DamageFacet } from "./damage-facet";
import { DateRangeForm } from "./date-range-form";
import { FacetGroup, FacetSection, SeverityGroup } from "./facet-group";

type Props = { params: SearchParams; facets: SearchResult["facets"]; damageEntries: CodeSearchEntry[] };

export function FacetPanel({ params, facets, damageEntries }: Props) {
  const damage = facets.code.map((v) => ({ ...v, href: searchHref(toggleValue(params, "code", v.value)) }));
  return (
    <div data-testid="facet-panel">
      <FacetGroup title="Stage" facet="status" values={facets.status} params={params} />
      <DamageFacet values={damage} entries={damageEntries} chosen={params.code.length} />
      <FacetGroup title="Part" facet="component" values={facets.component} params={params} />
      <FacetGroup title="Root cause" facet="cause" values={facets.cause} params={params} />
      <FacetGroup title="Trigger" facet="trigger" values={facets.trigger} params={params} />
      <SeverityGroup values={facets.severity} params={params} />
      <FacetGroup title="Bearing class" facet="class" values={facets.class} params={params} />
      <FacetGroup title="Site" facet="site" values={facets.site} params={params} />
      <FacetSection title="Removed" count={(params.from ? 1 : 0) + (params.to ? 1 : 0)}>
        <DateRangeForm params={params} />
      </FacetSection>
    </div>
  );
}
