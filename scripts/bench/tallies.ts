// p50 / p95 of the whole tallies page's data (every chart, one call of loadTallies) for a mix of
// filters as a manager and an inspector, of the life section (all time and one cause), each beside
// its raw-SQL floor, and of a Weibull fit of 10,000 lives with half of them suspensions.
import { sql } from "drizzle-orm";
import { db } from "@/db";
import { loadLife } from "@/lib/tallies/life-service";
import { loadTallies } from "@/lib/tallies/tallies-service";
import { fitWeibull } from "@/lib/stats/weibull";
import { addMonths, parseTallyFilters } from "@/lib/tallies/filters";
import { createRng } from "../seed/prng";
import { runBench, GROWTH_PASS, measure, percentile, record, timed } from "./support/figures";
import { benchViewers } from "./support/viewers";

const TARGET_MS = 150;
const REPEATS = 3;

async function workload(): Promise<{ label: string; query: Record<string, string>; as: "manager" | "inspector" }[]> {
  const { rows } = await db.execute<{ last: string; site: string; trigger: string }>(sql`
    select to_char(max(removed_on), 'YYYY-MM') as last,
      (select s.code from sites s join cases c on c.site_id = s.id group by s.code order by count(*) desc limit 1) as site,
      (select trigger from cases group by trigger order by count(*) desc limit 1) as trigger
    from cases`);
  const { last, site, trigger } = rows[0];
  const year = { from: addMonths(last, -11), to: last };
  return [
    { label: "all time", query: {}, as: "manager" },
    { label: "last 12 months", query: year, as: "manager" },
    { label: `site ${site}`, query: { site }, as: "manager" },
    { label: "class F, 12 months", query: { ...year, class: "F" }, as: "manager" },
    { label: `trigger ${trigger}`, query: { trigger }, as: "manager" },
    { label: "same car within 60 days", query: { cluster: "car", window: "60" }, as: "manager" },
    { label: "same lot, 12 months", query: { ...year, cluster: "lot" }, as: "manager" },
    { label: "inspector, all time", query: {}, as: "inspector" },
  ];
}

/** 10,000 lives in months, half failures and half suspensions (invented, seeded). */
function tenThousandLives() {
  const rng = createRng(20_261_203);
  return Array.from({ length: 10_000 }, (_, i) => {
    const t = 90 * Math.pow(-Math.log(1 - rng.next()), 1 / 2.2); // Weibull(beta 2.2, eta 90) by inversion
    return { time: Math.max(1, Math.round(t)), failed: i % 2 === 0 };
  });
}

await runBench(async () => {
  const who = await benchViewers();
  const runs = await workload();
  const tally = runs.map((r) => ({ label: `${r.as} ${r.label}`, run: () => loadTallies(parseTallyFilters(r.query), who[r.as]) }));
  await measure("tallies page data", tally, { repeats: REPEATS, target: TARGET_MS });

  const { rows: causes } = await db.execute<{ cause: string }>(sql`
    select primary_cause as cause from cases where status = 'signed' and primary_cause is not null group by 1 order by count(*) desc offset 1 limit 1`);
  const life = [
    ...runs.slice(0, 4).map((r) => ({ label: r.label, run: () => loadLife(parseTallyFilters(r.query), who[r.as], "months") })),
    { label: "inspector, all time", run: () => loadLife(parseTallyFilters({}), who.inspector, "months") },
    { label: "all time, miles", run: () => loadLife(parseTallyFilters({}), who.manager, "miles") },
  ];
  await measure("life section, all time and filters", life, { repeats: REPEATS, target: TARGET_MS });
  if (causes[0]) {
    const cause = causes[0].cause;
    await measure(
      `life section, one cause (${cause})`,
      [
        { label: cause, run: () => loadLife(parseTallyFilters({}), who.manager, "months", cause) },
        { label: `${cause} 12 months`, run: () => loadLife(parseTallyFilters(runs[1].query), who.manager, "months", cause) },
      ],
      { repeats: REPEATS * 2, target: TARGET_MS },
    );
  }

  if (!GROWTH_PASS) {
    const lives = tenThousandLives();
    fitWeibull(lives); // warm-up
    const ms: number[] = [];
    for (let i = 0; i < 20; i++) ms.push(await timed(async () => fitWeibull(lives)));
    record({
      name: "Weibull fit, 10,000 lives (half suspended)",
      runs: ms.length,
      p50: percentile(ms, 50),
      p95: percentile(ms, 95),
      unit: "ms",
      target: 50,
    });
  }
});
