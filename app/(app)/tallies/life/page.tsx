import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/card";
import { loadLife } from "@/lib/tallies/life-service";
import { can } from "@/lib/auth/permissions";
import { requirePageUser } from "@/lib/auth/session";
import { filtersToQuery, readTallyFilters } from "@/lib/tallies/filters";
import { monthLabel } from "@/lib/tallies/labels";
import { viewerSiteLimit } from "@/lib/tallies/site-limit";
import { tallySites } from "@/lib/tallies/tallies-service";
import { currentMonth, filterOptions } from "../_components/filter-options";
import { FilterBar } from "../_components/filter-bar";
import { TallyTabs } from "../_components/tally-tabs";
import { LifeBoard } from "./_components/life-board";

export const metadata: Metadata = { title: "Life statistics" };
export const dynamic = "force-dynamic";

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function LifePage({ searchParams }: Props) {
  const user = await requirePageUser("tallies:read");
  const params = await searchParams;
  const filters = readTallyFilters(params);
  const measure = params.measure === "miles" ? "miles" : "months";
  const cause = typeof params.cause === "string" ? params.cause.slice(0, 60) : undefined;
  const [data, sites] = await Promise.all([loadLife(filters, user, measure, cause), tallySites()]);
  const limit = viewerSiteLimit(user);
  const ownSite = limit.limited ? (sites.find((s) => s.id === limit.siteId)?.name ?? "No home site") : null;
  const where = ownSite ?? (filters.site ? (sites.find((s) => s.code === filters.site)?.name ?? filters.site) : "all sites");
  const when =
    filters.from || filters.to
      ? `${filters.from ? monthLabel(filters.from) : "start"} – ${filters.to ? monthLabel(filters.to) : "now"}`
      : "all time";
  return (
    <>
      <PageHeader title="Tallies" subtitle={`How early in life each cause takes bearings out · ${where} · ${when}`} />
      <TallyTabs active="life" query={filtersToQuery({ ...filters, cluster: "site", window: 30 })} />
      <FilterBar
        filters={filters}
        {...filterOptions(sites)}
        siteLimit={ownSite ? `${ownSite} (your shop)` : null}
        currentMonth={currentMonth()}
      />
      <LifeBoard data={data} canUpload={can(user.role, "fleet:upload")} scopeWords={`${where} · ${when}`} />
    </>
  );
}
