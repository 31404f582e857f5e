// p50 / p95 of the removal-yield page's data (every figure, one call of loadYield) for a mix of
// filters and missed-call windows, as a manager and as an inspector, beside its raw-SQL floor.
import { sql } from "drizzle-orm";
import { db } from "@/db";
import { addMonths, parseTallyFilters } from "@/lib/tallies/filters";
import { loadYield } from "@/lib/tallies/yield-service";
import { runBench, measure } from "./support/figures";
import { benchViewers } from "./support/viewers";

const TARGET_MS = 150;
const REPEATS = 3;

async function workload() {
  const { rows } = await db.execute<{ last: string; site: string }>(sql`
    select to_char(max(removed_on), 'YYYY-MM') as last,
      (select s.code from sites s join cases c on c.site_id = s.id group by s.code order by count(*) desc limit 1) as site
    from cases`);
  const { last, site } = rows[0];
  const year = { from: addMonths(last, -11), to: last };
  return [
    { label: "all time", query: {}, miss: 90, as: "manager" as const },
    { label: "last 12 months", query: year, miss: 90, as: "manager" as const },
    { label: `site ${site}`, query: { site }, miss: 90, as: "manager" as const },
    { label: "hot-bearing alarms only", query: { trigger: "wayside-hot" }, miss: 90, as: "manager" as const },
    { label: "missed calls within 365 days", query: {}, miss: 365, as: "manager" as const },
    { label: "inspector, all time", query: {}, miss: 90, as: "inspector" as const },
  ];
}

await runBench(async () => {
  const who = await benchViewers();
  const calls = (await workload()).map((r) => ({
    label: `${r.as} ${r.label}`,
    run: () => loadYield(parseTallyFilters(r.query), who[r.as], r.miss),
  }));
  await measure("removal-yield page data", calls, { repeats: REPEATS, target: TARGET_MS });
});
