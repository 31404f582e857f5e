import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/card";
import { requirePageUser } from "@/lib/auth/session";
import { filtersToQuery, readTallyFilters } from "@/lib/tallies/filters";
import { monthLabel } from "@/lib/tallies/labels";
import { readYieldQuery } from "@/lib/tallies/yield-query";
import { tallySites } from "@/lib/tallies/tallies-service";
import { loadYield } from "@/lib/tallies/yield-service";
import { currentMonth, filterOptions } from "../_components/filter-options";
import { FilterBar } from "../_components/filter-bar";
import { TallyTabs } from "../_components/tally-tabs";
import { MissWindow } from "./_components/miss-window";
import { YieldBoard } from "./_components/yield-board";

export const metadata: Metadata = { title: "Removal yield" };
export const dynamic = "force-dynamic";

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function YieldPage({ searchParams }: Props) {
  const user = await requirePageUser("tallies:read");
  const params = await searchParams;
  const filters = readTallyFilters(params);
  const { miss } = readYieldQuery(params);
  const [data, sites] = await Promise.all([loadYield(filters, user, miss), tallySites()]);
  const siteName = filters.site ? (sites.find((s) => s.code === filters.site)?.name ?? filters.site) : null;
  const where = data.siteLimit ? data.siteLimit.name : (siteName ?? "all sites");
  const when =
    filters.from || filters.to
      ? `${filters.from ? monthLabel(filters.from) : "start"} – ${filters.to ? monthLabel(filters.to) : "now"}`
      : "all time";
  return (
    <>
      <PageHeader
        title="Tallies"
        subtitle={`Were the removals right? Alarms, detectors and field calls against teardown · ${where} · ${when}`}
      />
      <TallyTabs active="yield" query={filtersToQuery({ ...filters, cluster: "site", window: 30 })} />
      <FilterBar
        filters={filters}
        {...filterOptions(sites)}
        siteLimit={data.siteLimit ? `${data.siteLimit.name} (your shop)` : null}
        currentMonth={currentMonth()}
      />
      <MissWindow value={miss} />
      <YieldBoard data={data} scopeWords={`${where} · ${when}`} />
    </>
  );
}
