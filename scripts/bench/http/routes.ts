// The API routes through the running production server, signed in as a manager: p50 / p95 at 1
// and at 10 concurrent clients (plain fetch loops for a few seconds each), beside the same work's
// in-process figure from this run, so the framework's cost shows.
import { readFileSync } from "node:fs";
import { Client } from "pg";
import { BENCH_CASES, percentile, record, type Figure } from "../support/figures";
import { APP_URL, signedInCookie } from "./session";

const SECONDS = Number(process.env.BENCH_HTTP_SECONDS ?? 5);
const MAX_RATIO = 3;

type Route = { name: string; paths: string[]; target: number; inProcess: string };

async function routes(): Promise<Route[]> {
  const pg = new Client({ connectionString: process.env.DATABASE_URL });
  await pg.connect();
  try {
    const ids = (await pg.query<{ id: string }>("select id from cases order by md5(id::text) limit 20")).rows.map((r) => r.id);
    const similar = (
      await pg.query<{ id: string }>(
        "select case_id as id from case_search where cardinality(finding_keys) > 0 order by md5(case_id::text) limit 10",
      )
    ).rows.map((r) => r.id);
    const cause =
      (
        await pg.query<{ cause: string }>(
          "select primary_cause as cause from cases where status = 'signed' and primary_cause is not null group by 1 order by count(*) desc offset 1 limit 1",
        )
      ).rows[0]?.cause ?? "";
    const deep = Math.max(2, Math.floor(BENCH_CASES / 25 / 20));
    return [
      { name: "case list, first page", paths: ["/api/cases"], target: 150, inProcess: "case list, first page" },
      {
        name: "case list, filtered and sorted",
        paths: ["/api/cases?status=signed&sort=removedOn:desc", "/api/cases?class=F&from=2024-01-01&to=2025-12-31&sort=removedOn:asc"],
        target: 150,
        inProcess: "case list, filtered and sorted",
      },
      { name: "case list, deep page", paths: [`/api/cases?page=${deep}`], target: 150, inProcess: "case list, deep page" },
      { name: "case page data", paths: ids.map((id) => `/api/cases/${id}`), target: 150, inProcess: "case page data" },
      {
        name: "search, words",
        paths: ["/api/search?q=spalling", "/api/search?q=milky%20grease", "/api/search?q=rust"],
        target: 300,
        inProcess: "search, words",
      },
      { name: "search, first view", paths: ["/api/search"], target: 300, inProcess: "search, first view" },
      { name: "similar cases", paths: similar.map((id) => `/api/cases/${id}/similar`), target: 300, inProcess: "similar cases" },
      { name: "tallies page data", paths: ["/api/tallies"], target: 300, inProcess: "tallies page data" },
      { name: "life section, all time", paths: ["/api/tallies/life"], target: 300, inProcess: "life section, all time and filters" },
      {
        name: "life section, one cause",
        paths: [`/api/tallies/life?cause=${encodeURIComponent(cause)}`],
        target: 300,
        inProcess: `life section, one cause (${cause})`,
      },
      {
        name: "removal yield",
        paths: ["/api/tallies/yield", "/api/tallies/yield?trigger=wayside-hot", "/api/tallies/yield?miss=365"],
        target: 300,
        inProcess: "removal-yield page data",
      },
    ];
  } finally {
    await pg.end();
  }
}

async function load(cookie: string, paths: string[], clients: number): Promise<{ ms: number[]; errors: number; rps: number }> {
  const ms: number[] = [];
  let errors = 0;
  let i = 0;
  const end = performance.now() + SECONDS * 1000;
  const client = async () => {
    while (performance.now() < end) {
      const path = paths[i++ % paths.length];
      const t0 = performance.now();
      const res = await fetch(`${APP_URL}${path}`, { headers: { cookie, origin: APP_URL } });
      await res.arrayBuffer();
      ms.push(performance.now() - t0);
      if (res.status !== 200) errors++;
    }
  };
  const t0 = performance.now();
  await Promise.all(Array.from({ length: clients }, client));
  return { ms, errors, rps: ms.length / ((performance.now() - t0) / 1000) };
}

const inProcess = new Map<string, Figure>();
for (const line of readFileSync(process.env.BENCH_RESULTS!, "utf8").split("\n").filter(Boolean)) {
  const f = JSON.parse(line) as Figure;
  if (f.cases === BENCH_CASES) inProcess.set(f.name, f);
}

const cookie = await signedInCookie("manager");
for (const r of await routes()) {
  await load(cookie, r.paths, 1).catch(() => undefined); // warm-up
  const base = inProcess.get(r.inProcess);
  for (const clients of [1, 10]) {
    const got = await load(cookie, r.paths, clients);
    const note = `${got.rps.toFixed(1)} req/s${got.errors ? `, ${got.errors} ERRORS` : ""}`;
    const fig = record({
      name: `HTTP ${r.name}, ${clients} client${clients > 1 ? "s" : ""}`,
      runs: got.ms.length,
      p50: percentile(got.ms, 50),
      p95: percentile(got.ms, 95),
      unit: "ms",
      // The target holds at 10 clients; one client is shown for the framework's own cost.
      target: clients === 10 ? r.target : undefined,
      floorP95: clients === 10 ? base?.p95 : undefined,
      maxRatio: clients === 10 && base ? MAX_RATIO : undefined,
      note,
    });
    if (got.errors) process.exitCode = 1;
    void fig;
  }
}
