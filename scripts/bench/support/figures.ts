// What every bench shares: timing, percentiles, the raw-SQL floor of a call, and one line per
// figure (p50 / p95, target, floor, ratio) appended to $BENCH_RESULTS for the summary.
import { appendFileSync } from "node:fs";
import { Pool, type QueryConfig } from "pg";
import { pool } from "@/db";

export const BENCH_CASES = Number(process.env.BENCH_CASES ?? 100_000);
export const GROWTH_PASS = process.env.BENCH_PASS === "growth";

export type Figure = {
  name: string;
  cases: number;
  runs: number;
  p50: number;
  p95: number;
  unit: "ms" | "s" | "kB" | "req/s";
  target?: number;
  targetOn?: "p50" | "p95";
  floorP95?: number;
  maxRatio?: number;
  ratio?: number;
  ok: boolean;
  note?: string;
};

/** Nearest-rank percentile. */
export function percentile(xs: number[], p: number): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.max(0, Math.ceil((p / 100) * s.length) - 1)];
}

export async function timed(fn: () => Promise<unknown>): Promise<number> {
  const t0 = performance.now();
  await fn();
  return performance.now() - t0;
}

const fmt = (n: number, unit: string) =>
  unit === "ms" ? `${n.toFixed(1)} ms` : unit === "s" ? `${n.toFixed(2)} s` : `${n.toFixed(1)} ${unit}`;

/** Prints one figure and records it. A figure misses when over its target or over its ratio to the floor. */
export function record(f: Omit<Figure, "ok" | "cases" | "ratio">): Figure {
  const ratio = f.floorP95 ? f.p95 / f.floorP95 : undefined;
  // Growth-pass figures are for the growth line; targets hold at the full size.
  const over = f.target !== undefined && (f.targetOn === "p50" ? f.p50 : f.p95) > f.target;
  const far = ratio !== undefined && f.maxRatio !== undefined && ratio > f.maxRatio;
  const ok = GROWTH_PASS || (!over && !far);
  const fig: Figure = { ...f, cases: BENCH_CASES, ratio, ok };
  const floor =
    f.floorP95 !== undefined
      ? `, floor p95 ${fmt(f.floorP95, f.unit)}, ×${ratio!.toFixed(2)}${f.maxRatio ? ` (≤ ${f.maxRatio}×)` : ""}`
      : "";
  const target = f.target !== undefined ? ` (target ${f.targetOn ?? "p95"} ≤ ${fmt(f.target, f.unit)})` : "";
  const verdict = GROWTH_PASS ? "" : ok ? " OK" : " MISSED";
  console.log(
    `${f.name}: ${f.runs} runs, p50 ${fmt(f.p50, f.unit)}, p95 ${fmt(f.p95, f.unit)}${target}${floor}${verdict}${f.note ? ` - ${f.note}` : ""}`,
  );
  if (process.env.BENCH_RESULTS) appendFileSync(process.env.BENCH_RESULTS, `${JSON.stringify(fig)}\n`);
  if (!ok) process.exitCode = 1;
  return fig;
}

type Captured = { config: QueryConfig; group: number };

/**
 * Runs fn once while noting every statement it sends through the app's pool, in the order and
 * overlap it sent them (statements sent while another was in flight form one parallel group).
 */
export async function capture(fn: () => Promise<unknown>): Promise<Captured[]> {
  const seen: Captured[] = [];
  const original = pool.query.bind(pool) as (...a: unknown[]) => Promise<unknown>;
  let inFlight = 0;
  let group = -1;
  (pool as unknown as { query: unknown }).query = (...args: unknown[]) => {
    const [a, b] = args;
    // drizzle sends (config, params); the floor keeps only the SQL text and its values.
    const config: QueryConfig =
      typeof a === "string"
        ? { text: a, values: b as unknown[] }
        : { text: (a as QueryConfig).text, values: (Array.isArray(b) ? b : (a as QueryConfig).values) as unknown[] };
    if (inFlight === 0) group++;
    seen.push({ config, group });
    inFlight++;
    return original(...args).finally(() => inFlight--);
  };
  try {
    await fn();
  } finally {
    (pool as unknown as { query: unknown }).query = original;
  }
  return seen;
}

let floorPool: Pool | null = null;
/** The floor: the captured statements sent as raw SQL through pg, groups one after another, each group at once. */
export async function replay(statements: Captured[]): Promise<number> {
  floorPool ??= new Pool({ connectionString: process.env.DATABASE_URL, max: 10 });
  const p = floorPool;
  const groups = new Map<number, QueryConfig[]>();
  for (const s of statements) groups.set(s.group, [...(groups.get(s.group) ?? []), s.config]);
  const t0 = performance.now();
  for (const g of groups.values()) await Promise.all(g.map((c) => p.query(c)));
  return performance.now() - t0;
}

export async function endFloor() {
  await floorPool?.end();
  floorPool = null;
}

export type Call = { label: string; run: () => Promise<unknown> };

/**
 * Times each call `repeats` times through the app, then the same statements raw through pg,
 * interleaved so both see the same machine load; records the figure with its floor.
 */
export async function measure(name: string, calls: Call[], opts: { repeats: number; target: number; maxRatio?: number; floor?: boolean }) {
  const app: number[] = [];
  const floor: number[] = [];
  const slow: { label: string; ms: number }[] = [];
  for (const c of calls) await c.run(); // warm-up: connections, plans, pages
  for (let i = 0; i < opts.repeats; i++) {
    for (const c of calls) {
      let statements: Captured[] = [];
      const t0 = performance.now();
      if (opts.floor === false) await c.run();
      else statements = await capture(c.run);
      const ms = performance.now() - t0;
      app.push(ms);
      slow.push({ label: c.label, ms });
      if (opts.floor !== false) floor.push(await replay(statements));
    }
  }
  const worst = slow
    .sort((a, b) => b.ms - a.ms)
    .slice(0, 3)
    .map((s) => `${s.label} ${s.ms.toFixed(0)} ms`)
    .join("; ");
  return record({
    name,
    runs: app.length,
    p50: percentile(app, 50),
    p95: percentile(app, 95),
    unit: "ms",
    target: opts.target,
    floorP95: floor.length ? percentile(floor, 95) : undefined,
    maxRatio: floor.length ? (opts.maxRatio ?? 1.5) : undefined,
    note: `slowest ${worst}`,
  });
}

/** Runs one bench: a thrown error fails it, and the floor's and the app's pools are closed either way. */
export async function runBench(body: () => Promise<void>): Promise<void> {
  try {
    await body();
  } catch (err) {
    console.error(err);
    process.exitCode = 1;
  } finally {
    await endFloor();
    await pool.end();
  }
}
