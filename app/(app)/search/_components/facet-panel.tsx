// All the filters beside the results: stage, trigger, cause, damage, part, class, site,
// worst finding and removal dates, each with counts for the current search.
import type { SearchResult } from "@/db/queries/search";
import type { SearchParams } from "@/lib/search/query-schema";
import { DateRangeForm } from "./date-range-form";
import { FacetGroup, FacetSection, SeverityGroup } from "./facet-group";

export function FacetPanel({ params, facets }: { params: SearchParams; facets: SearchResult["facets"] }) {
  return (
    <div data-testid="facet-panel">
      <FacetGroup title="Stage" facet="status" values={facets.status} params={params} />
      <FacetGroup title="Damage" facet="code" values={facets.code} params={params} />
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
