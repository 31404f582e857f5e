// Load: signed-in readers (case list, case page, search, tallies, photo thumbnails) through
// autocannon and writers (field report, receive, findings, photo, verdict, propose, sign) against the
// production build on loopback, for a bounded time. Prints p50/p99 and requests per second per route;
// fails on any 5xx, any request error, or any acknowledged write missing from the database afterwards.
// Runs under scripts/bench.sh (npm run bench -- load), which provides the services and the demo seed.
//   LOAD_CASES (100000: fills with seed:large up to this), LOAD_SECONDS (60), LOAD_READERS (50), LOAD_WRITERS (5)
//   NEXT_DIST_DIR (.next-bench) with REUSE_BUILD=1 reuses an earlier production build there.
import autocannon from "autocannon";
import { spawn, spawnSync } from "node:child_process";
import { existsSync } from "node:fs";
import pg from "pg";
import sharp from "sharp";
import { randomUUID } from "node:crypto";
import { DEMO_PASSWORD, DEMO_USERS } from "../seed/demo-people";
import { percentile } from "./support/figures";

const num = (name: string, fallback: number) => Number(process.env[name] ?? fallback);
const WANT_CASES = num("LOAD_CASES", Number(process.env.BENCH_CASES ?? 100_000));
const SECONDS = num("LOAD_SECONDS", 60);
const READERS = num("LOAD_READERS", 50);
const WRITERS = num("LOAD_WRITERS", 5);
const PORT = Number(process.env.APP_PORT ?? 3200);
const BASE = `http://127.0.0.1:${PORT}`;
const DIST = process.env.NEXT_DIST_DIR ?? ".next-bench";

const db = new pg.Pool({ connectionString: process.env.DATABASE_URL, max: 2 });
const q = async <R extends Record<string, unknown>>(text: string, values: unknown[] = []) => (await db.query<R>(text, values)).rows;

const percentileOr0 = (xs: number[], p: number) => (xs.length ? percentile(xs, p) : 0);

async function ensureCases() {
  const have = Number((await q<{ n: string }>("select count(*) as n from cases"))[0].n);
  if (have >= WANT_CASES) return have;
  console.log(`load bench: ${have} cases, generating ${WANT_CASES - have} more (npm run seed:large)…`);
  const run = spawnSync("node_modules/.bin/tsx", ["scripts/seed-large.ts", "--cases", String(WANT_CASES - have)], {
    stdio: ["ignore", "ignore", "inherit"],
    env: process.env,
  });
  if (run.status !== 0) throw new Error("seed:large failed");
  for (const t of ["cases", "findings", "case_search", "case_search_text", "search_words"])
    await q(`vacuum (analyze) ${t}`).catch(() => undefined);
  return Number((await q<{ n: string }>("select count(*) as n from cases"))[0].n);
}

async function startApp() {
  if (process.env.REUSE_BUILD !== "1" || !existsSync(`${DIST}/BUILD_ID`)) {
    console.log(`load bench: production build into ${DIST}…`);
    const build = spawnSync("node_modules/.bin/next", ["build"], {
      stdio: ["ignore", "ignore", "inherit"],
      env: { ...process.env, NEXT_DIST_DIR: DIST },
    });
    if (build.status !== 0) throw new Error("next build failed");
  }
  const app = spawn("node_modules/.bin/next", ["start", "-H", "127.0.0.1", "-p", String(PORT)], {
    stdio: "ignore",
    env: { ...process.env, NEXT_DIST_DIR: DIST, NODE_ENV: "production" },
  });
  for (let i = 0; i < 240; i++) {
    if (
      await fetch(`${BASE}/api/health`).then(
        () => true,
        () => false,
      )
    )
      return app;
    await new Promise((r) => setTimeout(r, 250));
  }
  app.kill();
  throw new Error("the app did not start");
}

async function signIn(role: string): Promise<string> {
  const u = DEMO_USERS.find((d) => d.role === role)!;
  const res = await fetch(`${BASE}/api/auth/sign-in/email`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: BASE },
    body: JSON.stringify({ email: u.email, password: DEMO_PASSWORD }),
  });
  if (res.status !== 200) throw new Error(`sign-in as ${role} failed: ${res.status}`);
  return res.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");
}

type RouteStats = {
  route: string;
  requests: number;
  seconds: number;
  p50: number;
  p99: number;
  non2xx: number;
  server5xx: number;
  errors: number;
};

/** One autocannon run per reader route, all at once, each with its share of the connections. */
async function readers(cookies: string[], pick: Record<string, () => string>): Promise<RouteStats[]> {
  const routes = Object.keys(pick);
  const per = Math.max(1, Math.floor(READERS / routes.length));
  return Promise.all(
    routes.map(async (route, i) => {
      const result = await autocannon({
        url: BASE,
        connections: per,
        duration: SECONDS,
        timeout: 30,
        headers: { cookie: cookies[i % cookies.length] },
        requests: [{ method: "GET", setupRequest: (req) => ({ ...req, path: pick[route]() }) }],
      });
      const codes = result.statusCodeStats as unknown as Record<string, { count: number }>;
      const server5xx = Object.entries(codes)
        .filter(([c]) => c.startsWith("5"))
        .reduce((n, [, v]) => n + v.count, 0);
      return {
        route,
        requests: result.requests.total,
        seconds: SECONDS,
        p50: result.latency.p50,
        p99: result.latency.p99,
        non2xx: result.non2xx,
        server5xx,
        errors: result.errors + result.timeouts,
      };
    }),
  );
}

type Ack = { kind: "case" | "finding" | "photo" | "step"; id: string; caseId: string; action?: string };

/** Writers: each files its own cases and takes them through the lab to a signature, recording every acknowledged write. */
async function writers(cookies: { inspector: string; analyst: string; engineer: string }, siteId: string) {
  const times = new Map<string, { ms: number[]; non2xx: number; server5xx: number; errors: number }>();
  const acks: Ack[] = [];
  const deadline = Date.now() + SECONDS * 1000;
  let photoSeed = Date.now() % 100_000;

  async function call(
    route: string,
    cookie: string,
    method: string,
    path: string,
    body: unknown,
    extra: Record<string, string> = {},
    // eslint-disable-next-line @typescript-eslint/no-explicit-any -- loosely read JSON answers of many routes
  ): Promise<Record<string, any> | null> {
    const t = times.get(route) ?? { ms: [], non2xx: 0, server5xx: 0, errors: 0 };
    times.set(route, t);
    const form = body instanceof FormData;
    const t0 = performance.now();
    try {
      const res = await fetch(`${BASE}${path}`, {
        method,
        headers: { cookie, origin: BASE, ...(form ? {} : { "content-type": "application/json" }), ...extra },
        body: method === "GET" ? undefined : form ? body : JSON.stringify(body),
        signal: AbortSignal.timeout(30_000),
      });
      // eslint-disable-next-line @typescript-eslint/no-explicit-any -- as above
      const json = (await res.json().catch(() => ({}))) as Record<string, any>;
      t.ms.push(performance.now() - t0);
      if (res.status >= 500) t.server5xx++;
      if (res.status >= 300) {
        t.non2xx++;
        console.log(`  ${route}: ${res.status} ${json.error ?? ""}`);
        return null;
      }
      return json;
    } catch {
      t.errors++;
      return null;
    }
  }

  async function oneCase() {
    // The Idempotency-Key a device sends with a filing, so a retried filing is one case.
    const filed = await call("POST /api/cases", cookies.inspector, "POST", "/api/cases", fieldReport(siteId), {
      "idempotency-key": randomUUID(),
    });
    if (!filed) return;
    const id = filed.case.id as string;
    acks.push({ kind: "case", id, caseId: id });
    let version = filed.case.version as number;
    const step = async (route: string, cookie: string, method: string, path: string, body: Record<string, unknown>) => {
      const r = await call(route, cookie, method, path, { version, ...body });
      if (r) version = r.case?.version ?? r.version;
      return r;
    };
    if (!(await step("POST transitions (receive)", cookies.analyst, "POST", `/api/cases/${id}/transitions`, { action: "receive" }))) return;
    acks.push({ kind: "step", id, caseId: id, action: "receive" });
    for (const component of ["cup", "cone-inboard"]) {
      const f = await step("POST findings", cookies.analyst, "POST", `/api/cases/${id}/findings`, {
        finding: { component, damageCode: "fatigue.subsurface", severity: 2, zone: "raceway" },
      });
      if (!f) return;
      acks.push({ kind: "finding", id: f.finding.id, caseId: id });
    }
    const photo = await uploadPhoto(id, ++photoSeed);
    if (!photo) return;
    acks.push({ kind: "photo", id: photo.photo.id, caseId: id });
    version = (await q<{ version: number }>("select version from cases where id = $1", [id]))[0].version;
    if (
      !(await step("PATCH verdict", cookies.analyst, "PATCH", `/api/cases/${id}`, {
        section: "verdict",
        data: {
          primaryCause: "end-of-life",
          contributingCauses: [],
          confidence: "probable",
          removalConfirmed: "confirmed",
          correctiveAction: "None.",
        },
      }))
    )
      return;
    if (!(await step("POST transitions (propose)", cookies.analyst, "POST", `/api/cases/${id}/transitions`, { action: "propose" }))) return;
    acks.push({ kind: "step", id, caseId: id, action: "propose" });
    // The signature ceremony, as the signer's screen does it: read what is signed, then send its hash
    // with the password again (the version sent is the step's idempotency key).
    const view = await call("GET signature", cookies.engineer, "GET", `/api/cases/${id}/signature`, undefined);
    if (!view) return;
    if (
      !(await step("POST signature", cookies.engineer, "POST", `/api/cases/${id}/signature`, {
        version: view.version,
        password: DEMO_PASSWORD,
        contentHash: view.contentHash,
        meaningAccepted: true,
      }))
    )
      return;
    acks.push({ kind: "step", id, caseId: id, action: "sign" });
  }

  async function uploadPhoto(caseId: string, seed: number) {
    const bytes = await sharp({
      create: {
        width: 1600,
        height: 1200,
        channels: 3,
        background: { r: seed % 256, g: (seed * 7) % 256, b: (seed * 13) % 256 },
        noise: { type: "gaussian", mean: 100, sigma: 30 },
      },
    })
      .jpeg({ quality: 85 })
      .toBuffer();
    const form = new FormData();
    form.set("file", new Blob([new Uint8Array(bytes)], { type: "image/jpeg" }), `load-${seed}.jpg`);
    form.set("component", "cup");
    return call("POST photos", cookies.analyst, "POST", `/api/cases/${caseId}/photos`, form);
  }

  await Promise.all(
    Array.from({ length: WRITERS }, async () => {
      while (Date.now() < deadline) await oneCase();
    }),
  );
  return { times, acks };
}

function fieldReport(siteId: string) {
  const n = Math.floor(Math.random() * 1e8);
  return {
    siteId,
    removedOn: "2026-10-20",
    carMark: "LDTX",
    carNumber: String(200000 + (n % 99999)),
    axle: 2,
    side: "R",
    wheelDiameterIn: 36,
    trigger: "hand-roll",
    triggerDetail: { felt: "roughness" },
    serial: `LD${n}`,
    bearingClass: "F",
    makerCode: "MK-T",
    mountedOn: "2020-04-20",
    serviceMiles: 420000,
    fieldChecks: {
      handRoll: {
        grid: { "0": { pull: { feel: "rough", revolutions: 2 }, push: { feel: "smooth", revolutions: 2 } } },
        procedure: { turnedBy: "hand", oneDirection: true, judgedBy: "feel" },
      },
      visual: [],
      confirmations: { ppe: true, blueSignal: true, wheelsetSecured: true },
    },
    fieldNotes: "Filed by the load bench.",
  };
}

/** Every write the app acknowledged is in the database. */
async function missingWrites(acks: Ack[]): Promise<string[]> {
  const missing: string[] = [];
  const has = async (sqlText: string, v: unknown[]) => (await q(sqlText, v)).length > 0;
  for (const a of acks) {
    const ok =
      a.kind === "case"
        ? await has("select 1 from cases where id = $1", [a.id])
        : a.kind === "finding"
          ? await has("select 1 from findings where id = $1 and case_id = $2", [a.id, a.caseId])
          : a.kind === "photo"
            ? await has("select 1 from photos where id = $1 and case_id = $2", [a.id, a.caseId])
            : await has("select 1 from case_events where case_id = $1 and action = $2", [a.caseId, a.action]);
    if (!ok) missing.push(`${a.kind} ${a.action ?? ""} ${a.id}`);
  }
  return missing;
}

const row = (s: RouteStats) =>
  `  ${s.route.padEnd(30)} ${String(s.requests).padStart(7)} req ${(s.requests / s.seconds).toFixed(1).padStart(7)} req/s  p50 ${s.p50.toFixed(0).padStart(5)} ms  p99 ${s.p99.toFixed(0).padStart(6)} ms  non-2xx ${s.non2xx}  5xx ${s.server5xx}  errors ${s.errors}`;

let app: ReturnType<typeof spawn> | undefined;
try {
  const total = await ensureCases();
  app = await startApp();
  const [engineer, manager, analyst, inspector] = await Promise.all(["engineer", "manager", "analyst", "inspector"].map(signIn));
  const numbers = (await q<{ number: string }>("select number from cases order by md5(id::text) limit 300")).map((r) => r.number);
  const photoIds = (await q<{ id: string }>("select id from photos order by md5(id::text) limit 100")).map((r) => r.id);
  const words = ["spall", "water etch", "cup", "cone", "brinell", "overheat", "lubricant", "seal", "fatigue", "roller"];
  const any = <T>(xs: T[]) => xs[Math.floor(Math.random() * xs.length)];
  const siteId = (await q<{ id: string }>("select id from sites where code = 'MJC'"))[0].id;
  console.log(`load bench: ${total.toLocaleString("en-US")} cases, ${READERS} readers and ${WRITERS} writers for ${SECONDS} s on ${BASE}`);

  const readerRoutes: Record<string, () => string> = {
    "GET /cases (list)": () => `/cases?page=${1 + Math.floor(Math.random() * 20)}`,
    "GET /cases/[number]": () => `/cases/${any(numbers)}`,
    "GET /search": () => `/search?q=${encodeURIComponent(any(words))}`,
    "GET /tallies": () => "/tallies",
    ...(photoIds.length ? { "GET /api/photos/[id]/thumb": () => `/api/photos/${any(photoIds)}/thumb` } : {}),
  };
  // Warm-up, outside the figures: each page once, as a server that has been up a while has them.
  for (const [route, path] of Object.entries(readerRoutes)) {
    const res = await fetch(`${BASE}${path()}`, { headers: { cookie: engineer } });
    if (res.status >= 300) console.log(`  warm-up ${route}: ${res.status}`);
  }
  const [readStats, writeRun] = await Promise.all([
    readers([engineer, manager, analyst], readerRoutes),
    writers({ inspector, analyst, engineer }, siteId),
  ]);
  const writeStats: RouteStats[] = [...writeRun.times.entries()].map(([route, t]) => ({
    route,
    requests: t.ms.length + t.errors,
    seconds: SECONDS,
    p50: percentileOr0(t.ms, 50),
    p99: percentileOr0(t.ms, 99),
    non2xx: t.non2xx,
    server5xx: t.server5xx,
    errors: t.errors,
  }));

  console.log("readers:");
  readStats.forEach((s) => console.log(row(s)));
  console.log("writers:");
  writeStats.forEach((s) => console.log(row(s)));
  const missing = await missingWrites(writeRun.acks);
  const all = [...readStats, ...writeStats];
  const fives = all.reduce((n, s) => n + s.server5xx, 0);
  const errors = all.reduce((n, s) => n + s.errors, 0);
  console.log(
    `acknowledged writes: ${writeRun.acks.length}, missing afterwards: ${missing.length}${missing.length ? ` (${missing.slice(0, 5).join("; ")})` : ""}`,
  );
  console.log(`5xx answers: ${fives}, request errors or timeouts: ${errors}`);
  if (fives || errors || missing.length) {
    console.error("load bench FAILED");
    process.exitCode = 1;
  } else console.log("load bench OK");
} finally {
  app?.kill("SIGTERM");
  await db.end();
}
