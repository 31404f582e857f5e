// p50 and p95 of the removal-yield page's data (every figure, one call of loadYield) over 100,000
// cases, for a mix of filters and missed-call windows, as a manager and as an inspector. Fills the
// database with the large invented casebook first when it holds fewer cases. Runs under
// scripts/bench.sh, or alone given DATABASE_URL:
//   node_modules/.bin/tsx --conditions=react-server scripts/bench/removal-yield.ts [--cases 100000]
import { spawnSync } from "node:child_process";
import { sql } from "drizzle-orm";
import { db, pool } from "@/db";
import type { CallViewer } from "@/db/queries/tallies/yield-calls";
import { addMonths, parseTallyFilters } from "@/lib/tallies/filters";
import { loadYield } from "@/lib/tallies/yield-service";

const TARGET_P95_MS = 150;
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
  console.log(`removal-yield bench: ${have} cases, generating ${WANT - have} more (npm run seed:large)…`);
  const run = spawnSync("node_modules/.bin/tsx", ["scripts/seed-large.ts", "--cases", String(WANT - have)], { stdio: "inherit", env: process.env });
  if (run.status !== 0) throw new Error("seed:large failed");
  await db.execute(sql`vacuum analyze cases`);
  return count();
}

async function viewers(): Promise<{ manager: CallViewer; inspector: CallViewer }> {
  const { rows } = await db.execute<{ id: string; role: string; site_id: string | null }>(sql`select id, role, site_id from "user" where role in ('manager', 'inspector') order by email`);
  const pick = (role: string) => rows.find((r) => r.role === role)!;
  const m = pick("manager");
  const i = pick("inspector");
  return { manager: { id: m.id, role: "manager", siteId: null }, inspector: { id: i.id, role: "inspector", siteId: i.site_id } };
}

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

try {
  const total = await ensureCases();
  const who = await viewers();
  const runs = await workload();
  console.log(`removal-yield bench: ${total.toLocaleString("en-US")} cases, ${runs.length} settings x ${REPEATS}`);
  for (const r of runs.slice(0, 2)) await loadYield(parseTallyFilters(r.query), who[r.as], r.miss);
  const times: { label: string; ms: number }[] = [];
  for (let i = 0; i < REPEATS; i++) {
    for (const r of runs) {
      const t0 = performance.now();
      await loadYield(parseTallyFilters(r.query), who[r.as], r.miss);
      times.push({ label: `${r.as} ${r.label}`, ms: performance.now() - t0 });
    }
  }
  const ms = times.map((t) => t.ms);
  const p95 = percentile(ms, 95);
  console.log(`removal-yield page data: ${times.length} runs, p50 ${percentile(ms, 50).toFixed(1)} ms, p95 ${p95.toFixed(1)} ms (target p95 < ${TARGET_P95_MS} ms) ${p95 < TARGET_P95_MS ? "OK" : "OVER TARGET"}`);
  console.log(`  slowest: ${[...times].sort((a, b) => b.ms - a.ms).slice(0, 3).map((t) => `${t.label} ${t.ms.toFixed(0)} ms`).join("; ")}`);
  if (p95 >= TARGET_P95_MS) process.exitCode = 1;
} catch (err) {
  console.error(err);
  process.exitCode = 1;
} finally {
  await pool.end();
}
