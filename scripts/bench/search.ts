// p50 and p95 of case search and of similar-case lookups over 100,000 cases, calling the
// query functions the app uses. Fills the database with the large invented casebook first
// when it holds fewer cases. Runs under scripts/bench.sh, or alone given DATABASE_URL:
//   node_modules/.bin/tsx --conditions=react-server scripts/bench/search.ts [--cases 100000]
import { spawnSync } from "node:child_process";
import { sql } from "drizzle-orm";
import { db, pool } from "@/db";
import { searchCases, type SearchViewer } from "@/db/queries/search";
import { findSimilarCases } from "@/db/queries/similar";
import { parseSearchParams } from "@/lib/search/query-schema";
import { benchQueries } from "./support/search-workload";

const TARGET_P95_MS = 150;
const SIMILAR_RUNS = 50;
const argCases = process.argv.indexOf("--cases");
const WANT = argCases >= 0 ? Number(process.argv[argCases + 1]) : 100_000;

const count = async (q: ReturnType<typeof sql>) => Number(((await db.execute<{ n: string }>(q)).rows[0]).n);

/** Nearest-rank percentile. */
function percentile(xs: number[], p: number): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.max(0, Math.ceil((p / 100) * s.length) - 1)];
}

async function ensureCases() {
  const have = await count(sql`select count(*) as n from cases`);
  if (have >= WANT) return have;
  console.log(`search bench: ${have} cases, generating ${WANT - have} more (npm run seed:large)…`);
  const run = spawnSync("node_modules/.bin/tsx", ["scripts/seed-large.ts", "--cases", String(WANT - have)], { stdio: "inherit", env: process.env });
  if (run.status !== 0) throw new Error("seed:large failed");
  return count(sql`select count(*) as n from cases`);
}

/** What autovacuum does within a minute of a bulk load: clear the replaced search rows, refresh statistics. */
async function settle() {
  for (const table of ["case_search", "case_search_text", "search_words"]) await db.execute(sql.raw(`vacuum (analyze) ${table}`));
}

async function viewers(): Promise<{ engineer: SearchViewer; inspector: SearchViewer }> {
  const { rows } = await db.execute<{ id: string; role: string; site_id: string | null }>(sql`select id, role, site_id from "user" where role in ('engineer', 'inspector') order by email`);
  const pick = (role: string) => rows.find((r) => r.role === role)!;
  const v = (r: { id: string; role: string; site_id: string | null }) => ({ id: r.id, role: r.role, siteId: r.site_id });
  return { engineer: v(pick("engineer")), inspector: v(pick("inspector")) };
}

async function timed<T>(fn: () => Promise<T>): Promise<[number, T]> {
  const t0 = performance.now();
  const out = await fn();
  return [performance.now() - t0, out];
}

function report(name: string, times: { label: string; ms: number }[]) {
  const ms = times.map((t) => t.ms);
  const p50 = percentile(ms, 50), p95 = percentile(ms, 95);
  const slowest = [...times].sort((a, b) => b.ms - a.ms).slice(0, 3).map((t) => `${t.label} ${t.ms.toFixed(0)} ms`).join("; ");
  console.log(`${name}: ${times.length} runs, p50 ${p50.toFixed(1)} ms, p95 ${p95.toFixed(1)} ms (target p95 < ${TARGET_P95_MS} ms) ${p95 < TARGET_P95_MS ? "OK" : "OVER TARGET"}`);
  console.log(`  slowest: ${slowest}`);
  return p95 < TARGET_P95_MS;
}

try {
  const total = await ensureCases();
  await settle();
  const who = await viewers();
  const queries = await benchQueries(db);
  console.log(`search bench: ${total.toLocaleString("en-US")} cases, ${queries.length} searches, ${SIMILAR_RUNS} similar-case lookups`);

  // Warm-up: first connections, plans and pages, as a running app would have them.
  for (const q of queries.slice(0, 5)) await searchCases(parseSearchParams(Object.fromEntries(new URLSearchParams(q.query))), who.engineer);

  const searchTimes: { label: string; ms: number }[] = [];
  for (const q of queries) {
    const viewer = q.asInspector ? who.inspector : who.engineer;
    const [ms, r] = await timed(() => searchCases(parseSearchParams(Object.fromEntries(new URLSearchParams(q.query))), viewer));
    searchTimes.push({ label: `${q.asInspector ? "inspector " : ""}?${q.query} (${r.total})`, ms });
  }

  const { rows: targets } = await db.execute<{ id: string }>(sql`
    select case_id as id from case_search where cardinality(finding_keys) > 0 order by md5(case_id::text) limit ${SIMILAR_RUNS}`);
  const similarTimes: { label: string; ms: number }[] = [];
  for (const [i, t] of targets.entries()) {
    const viewer = i % 10 === 9 ? who.inspector : who.engineer;
    const [ms, r] = await timed(() => findSimilarCases(t.id, viewer));
    similarTimes.push({ label: `${t.id.slice(0, 8)} (${r.length})`, ms });
  }

  const ok = [report("search", searchTimes), report("similar cases", similarTimes)].every(Boolean);
  // The page's first view again: its counts now come from the cache until the casebook changes.
  const [again] = await timed(() => searchCases(parseSearchParams({}), who.engineer));
  console.log(`  search page first view, counted once already: ${again.toFixed(1)} ms`);
  if (!ok) process.exitCode = 1;
} catch (err) {
  console.error(err);
  process.exitCode = 1;
} finally {
  await pool.end();
}
