// p50 and p95 of the whole tallies page's data (every chart, one call of loadTallies) over
// 100,000 cases, for a mix of filters and both a manager and an inspector; the life section
// is timed beside it. Fills the database with the large invented casebook first when it holds
// fewer cases. Runs under scripts/bench.sh, or alone given DATABASE_URL:
//   node_modules/.bin/tsx --conditions=react-server scripts/bench/tallies.ts [--cases 100000]
import { spawnSync } from "node:child_process";
import { sql } from "drizzle-orm";
import { db, pool } from "@/db";
import { loadLife } from "@/db/queries/tallies/load-life";
import { loadTallies } from "@/db/queries/tallies/load-tallies";
import type { TallyViewer } from "@/db/queries/tallies/scope";
import { addMonths, parseTallyFilters } from "@/lib/tallies/filters";

const TARGET_P95_MS = 300;
const REPEATS = 3;
const argCases = process.argv.indexOf("--cases");
const WANT = argCases >= 0 ? Number(process.argv[argCases + 1]) : 100_000;

const count = async () => Number((await db.execute<{ n: string }>(sql`select count(*) as n from cases`)).rows[0].n);

/** Nearest-rank percentile. */
function percentile(xs: number[], p: number): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.max(0, Math.ceil((p / 100) * s.length) - 1)];
}

async function ensureCases(): Promise<number> {
  const have = await count();
  if (have >= WANT) return have;
  console.log(`tallies bench: ${have} cases, generating ${WANT - have} more (npm run seed:large)…`);
  const run = spawnSync("node_modules/.bin/tsx", ["scripts/seed-large.ts", "--cases", String(WANT - have)], { stdio: "inherit", env: process.env });
  if (run.status !== 0) throw new Error("seed:large failed");
  await db.execute(sql`vacuum analyze cases`);
  await db.execute(sql`vacuum analyze findings`);
  return count();
}

async function viewers(): Promise<{ manager: TallyViewer; inspector: TallyViewer }> {
  const { rows } = await db.execute<{ id: string; role: string; site_id: string | null }>(sql`select id, role, site_id from "user" where role in ('manager', 'inspector') order by email`);
  const pick = (role: string) => rows.find((r) => r.role === role)!;
  return { manager: { id: pick("manager").id, role: "manager", siteId: null }, inspector: { id: pick("inspector").id, role: "inspector", siteId: pick("inspector").site_id } };
}

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

async function timed(fn: () => Promise<unknown>): Promise<number> {
  const t0 = performance.now();
  await fn();
  return performance.now() - t0;
}

function report(name: string, times: { label: string; ms: number }[], target: number | null): boolean {
  const ms = times.map((t) => t.ms);
  const p50 = percentile(ms, 50);
  const p95 = percentile(ms, 95);
  const verdict = target === null ? "(no target)" : `(target p95 < ${target} ms) ${p95 < target ? "OK" : "OVER TARGET"}`;
  console.log(`${name}: ${times.length} runs, p50 ${p50.toFixed(1)} ms, p95 ${p95.toFixed(1)} ms ${verdict}`);
  const slowest = [...times].sort((a, b) => b.ms - a.ms).slice(0, 3).map((t) => `${t.label} ${t.ms.toFixed(0)} ms`).join("; ");
  console.log(`  slowest: ${slowest}`);
  return target === null || p95 < target;
}

try {
  const total = await ensureCases();
  const who = await viewers();
  const runs = await workload();
  console.log(`tallies bench: ${total.toLocaleString("en-US")} cases, ${runs.length} filter sets x ${REPEATS}`);

  // Warm-up: first connections, plans and pages, as a running app would have them.
  for (const r of runs.slice(0, 3)) await loadTallies(parseTallyFilters(r.query), who[r.as]);

  const tallies: { label: string; ms: number }[] = [];
  for (let i = 0; i < REPEATS; i++) {
    for (const r of runs) tallies.push({ label: `${r.as} ${r.label}`, ms: await timed(() => loadTallies(parseTallyFilters(r.query), who[r.as])) });
  }
  const ok = report("tallies page data", tallies, TARGET_P95_MS);

  const life: { label: string; ms: number }[] = [];
  for (const r of runs.slice(0, 4)) life.push({ label: r.label, ms: await timed(() => loadLife(parseTallyFilters(r.query), who[r.as], "months")) });
  report("life section data", life, null);
  if (!ok) process.exitCode = 1;
} catch (err) {
  console.error(err);
  process.exitCode = 1;
} finally {
  await pool.end();
}
