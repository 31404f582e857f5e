import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/card";
import { loadTallies, tallySites } from "@/lib/tallies/tallies-service";
import { can } from "@/lib/auth/permissions";
import { requirePageUser } from "@/lib/auth/session";
import { filtersToQuery, monthRange, readTallyFilters } from "@/lib/tallies/filters";
import { monthLabel } from "@/lib/tallies/labels";
import { currentMonth, filterOptions } from "./_components/filter-options";
import { FilterBar } from "./_components/filter-bar";
import { SendDigestButton } from "./_components/send-digest-button";
import { TalliesBoard } from "./_components/tallies-board";
import { TallyTabs } from "./_components/tally-tabs";

export const metadata: Metadata = { title: "Tallies" };
export const dynamic = "force-dynamic";

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function TalliesPage({ searchParams }: Props) {
  const user = await requirePageUser("tallies:read");
  const filters = readTallyFilters(await searchParams);
  const [data, sites] = await Promise.all([loadTallies(filters, user), tallySites()]);
  const options = filterOptions(sites);
  const siteName = filters.site ? (sites.find((s) => s.code === filters.site)?.name ?? filters.site) : null;
  const where = data.siteLimit ? data.siteLimit.name : (siteName ?? "all sites");
  const when =
    filters.from || filters.to
      ? `${monthLabel(filters.from ?? data.monthly.months[0] ?? filters.to!)} – ${monthLabel(filters.to ?? data.monthly.months.at(-1) ?? filters.from!)}`
      : "all time";
  const months = filters.from && filters.to ? monthRange(filters.from, filters.to).length : null;
  return (
    <>
      <PageHeader
        title="Tallies"
        subtitle={`Which causes recur, where, and whether removals were right · ${where} · ${when}${months ? ` (${months} months)` : ""}`}
        actions={can(user.role, "digest:send") ? <SendDigestButton /> : undefined}
      />
      <TallyTabs active="overview" query={filtersToQuery({ ...filters, cluster: "site", window: 30 })} />
      <FilterBar
        filters={filters}
        {...options}
        siteLimit={data.siteLimit ? `${data.siteLimit.name} (your shop)` : null}
        currentMonth={currentMonth()}
      />
      <TalliesBoard data={data} scopeWords={`${where} · ${when}`} />
    </>
  );
}
