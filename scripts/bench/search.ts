// p50 / p95 of case search (words, codes, identifiers, the first view) and of similar-case
// lookups, calling the query functions the app uses, each beside its raw-SQL floor.
import { sql } from "drizzle-orm";
import { db } from "@/db";
import { searchCases } from "@/db/queries/search";
import { findSimilarCases } from "@/lib/cases/similar-service";
import { parseSearchParams } from "@/lib/search/query-schema";
import { runBench, measure } from "./support/figures";
import { benchQueries } from "./support/search-workload";
import { benchViewers } from "./support/viewers";

const TARGET_MS = 100;
const SIMILAR_RUNS = 40;
// Search ranks words in code, not only in SQL: its floor is looser than a plain read's.
const SEARCH_RATIO = 3;

await runBench(async () => {
  const who = await benchViewers();
  const kinds = await benchQueries(db);
  for (const [kind, queries] of Object.entries(kinds)) {
    const calls = queries.map((q) => ({
      label: `${q.asInspector ? "inspector " : ""}?${q.query}`,
      run: () =>
        searchCases(parseSearchParams(Object.fromEntries(new URLSearchParams(q.query))), q.asInspector ? who.inspector : who.engineer),
    }));
    await measure(`search, ${kind}`, calls, { repeats: kind === "first view" ? 5 : 1, target: TARGET_MS, maxRatio: SEARCH_RATIO });
  }
  const { rows: targets } = await db.execute<{ id: string }>(sql`
    select case_id as id from case_search where cardinality(finding_keys) > 0 order by md5(case_id::text) limit ${SIMILAR_RUNS}`);
  await measure(
    "similar cases",
    targets.map((t, i) => ({ label: t.id.slice(0, 8), run: () => findSimilarCases(t.id, i % 10 === 9 ? who.inspector : who.engineer) })),
    { repeats: 1, target: TARGET_MS, maxRatio: SEARCH_RATIO },
  );
});
