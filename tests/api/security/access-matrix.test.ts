// Route x role x scope: every API route method and every page, called anonymously, as each role and as
// an inspector of another shop, against real cases in each of the four stages. Each answer must be the
// one lib/auth/permissions.ts (and the stage rules in lib/cases/workflow.ts) gives, and no answer may
// carry the number of a case the caller may not read: JSON, HTML, CSV, PDF text or ZIP listing.
// A new route file, page or permission without a row in tests/api/auth/route-table.ts fails here.
import { beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { PERMISSIONS, can, type Permission, type Role } from "../../../lib/auth/permissions";
import { canReadCase } from "../../../lib/cases/access";
import { STAGES, type Stage } from "../../../lib/cases/stages";
import { ApiClient, as, demoUser, type DemoRole } from "../../support/api";
import { db, t } from "../../support/db";
import { createCase, siteId } from "../../support/factories";
import { pdfPages } from "../../support/pdf-text";
import { smallPng } from "../../support/photo-files";
import { pagePatterns, routeKeys } from "../auth/route-files";
import {
  NO_ID,
  PAGE_RULES,
  REACH_PERMISSIONS,
  ROUTE_RULES,
  ROUTE_TABLE,
  SAMPLE_PARAMS,
  type Gate,
  type MatrixProbe,
  type ProbeCase,
} from "../auth/route-table";

type Who = DemoRole | "anonymous" | "inspector.pellham";
type Caller = { who: Who; client: ApiClient; viewer: { id: string; role: Role; siteId: string | null } | null };
const CALLER_NAMES: Who[] = ["anonymous", "inspector", "analyst", "engineer", "manager", "admin", "inspector.pellham"];
const NUMBER = /TL-\d{2}-\d{5}/g; // case numbers as db/queries/case-number.ts writes them

const callers: Caller[] = [];
const targets = new Map<Stage, ProbeCase & { siteId: string | null; createdBy: string | null }>();
let allCases: { number: string; siteId: string | null; createdBy: string | null }[] = [];

async function viewerOf(email: string) {
  const [u] = await db.select({ id: t.user.id, role: t.user.role, siteId: t.user.siteId }).from(t.user).where(eq(t.user.email, email));
  return { id: u.id, role: u.role as Role, siteId: u.siteId };
}

/** A field-stage case at `site`, with a finding, a photo and links to `linkTo`, built through the API where the app writes history. */
async function seedCase(site: string, by: DemoRole | "inspector.pellham", linkTo: { id: string }[] = []) {
  const creator = by === "inspector.pellham" ? await viewerOf("inspector.pellham@sable-river.example") : await viewerOf(demoUser(by).email);
  const row = await createCase({
    siteId: await siteId(site),
    createdBy: creator.id,
    status: "field",
    findings: [{ component: "cup", damageCode: "fatigue.subsurface", severity: 3 }],
  });
  const admin = await as("admin");
  const form = new FormData();
  form.set(
    "file",
    new Blob([new Uint8Array(await smallPng(row.number.length + Math.floor(Math.random() * 200)))], { type: "image/png" }),
    "matrix.png",
  );
  const up = await admin.request("POST", `/api/cases/${row.id}/photos`, form);
  if (up.status !== 201) throw new Error(`photo upload for the matrix failed: ${up.status} ${await up.text()}`);
  const engineer = await as("engineer");
  for (const other of linkTo) {
    const res = await engineer.post(`/api/cases/${row.id}/links`, { relatedId: other.id, note: `Same lot as the other case` });
    if (res.status !== 201) throw new Error(`link for the matrix failed: ${res.status} ${await res.text()}`);
  }
  return row;
}

/** Moves a seeded case to `stage` (links are made first: a signed case refuses new links). */
async function moveTo(row: { id: string }, stage: Stage) {
  const engineerId = (await viewerOf(demoUser("engineer").email)).id;
  const analystId = (await viewerOf(demoUser("analyst").email)).id;
  const stageValues: Record<Stage, Partial<typeof t.cases.$inferInsert>> = {
    field: {},
    bench: { receivedAt: new Date(), receivedBy: analystId },
    signoff: {
      receivedAt: new Date(),
      receivedBy: analystId,
      proposedAt: new Date(),
      proposedBy: analystId,
      primaryCause: "water-ingress",
      confidence: "probable",
      removalConfirmed: "confirmed",
    },
    signed: {
      receivedAt: new Date(),
      receivedBy: analystId,
      proposedAt: new Date(),
      proposedBy: analystId,
      primaryCause: "water-ingress",
      confidence: "probable",
      removalConfirmed: "confirmed",
      signedAt: new Date(),
      signedBy: engineerId,
    },
  };
  const [moved] = await db
    .update(t.cases)
    .set({ status: stage, ...stageValues[stage] })
    .where(eq(t.cases.id, row.id))
    .returning();
  const [finding] = await db.select({ id: t.findings.id }).from(t.findings).where(eq(t.findings.caseId, row.id));
  const [photo] = await db.select({ id: t.photos.id }).from(t.photos).where(eq(t.photos.caseId, row.id));
  return {
    id: moved.id,
    number: moved.number,
    version: moved.version,
    stage,
    findingId: finding.id,
    photoId: photo.id,
    siteId: moved.siteId,
    createdBy: moved.createdBy,
  };
}

beforeAll(async () => {
  for (const who of CALLER_NAMES) {
    if (who === "anonymous") callers.push({ who, client: new ApiClient(), viewer: null });
    else {
      const email = who === "inspector.pellham" ? "inspector.pellham@sable-river.example" : demoUser(who).email;
      callers.push({ who, client: await as(who), viewer: await viewerOf(email) });
    }
  }
  for (const stage of STAGES) {
    // Another shop's case and a case no inspector may read, each linked to the case under test.
    const other = await seedCase("PYC", "inspector.pellham");
    const hidden = await seedCase("OSW", "analyst");
    const target = await seedCase("MJC", "inspector", [other, hidden]);
    await moveTo(other, stage);
    await moveTo(hidden, stage);
    targets.set(stage, await moveTo(target, stage));
  }
  allCases = await db.select({ number: t.cases.number, siteId: t.cases.siteId, createdBy: t.cases.createdBy }).from(t.cases);
}, 240_000);

/** Case numbers in a body that the caller may not read (a number the caller put in the URL is not news to them). */
function leaks(caller: Caller, text: string, asked = ""): string[] {
  const found = new Set((text.match(NUMBER) ?? []).filter((n) => !asked.includes(n)));
  if (!found.size) return [];
  return allCases.filter((c) => found.has(c.number) && !(caller.viewer && canReadCase(caller.viewer, c))).map((c) => c.number);
}

async function bodyText(res: Response): Promise<string> {
  const type = res.headers.get("content-type") ?? "";
  const bytes = new Uint8Array(await res.arrayBuffer());
  if (type.includes("application/pdf") && res.status === 200) return pdfPages(bytes).join("\n");
  // A ZIP's listing (local and central headers) is stored uncompressed, so reading it as bytes reads the names.
  return Buffer.from(bytes).toString(type.includes("zip") ? "latin1" : "utf8");
}

function hasGate(caller: Caller, gate: Gate): boolean {
  if (gate === "public") return true;
  if (!caller.viewer) return false;
  return gate === "signed-in" ? true : can(caller.viewer.role, gate);
}

/** What is wrong with an answer; null when it is the one the rules give. */
function apiProblem(
  caller: Caller,
  gate: Gate,
  reachable: boolean,
  probe: MatrixProbe,
  stage: Stage | null,
  status: number,
  aimedAtNoId: boolean,
): string | null {
  if (status >= 500) return `server error ${status}`;
  if (gate === "public") return null; // who may call the auth library's own endpoints is role-guards.test.ts's job
  if (!caller.viewer) return status === 401 ? null : `anonymous got ${status}, expected 401`;
  const role = caller.viewer.role;
  const permitted = probe.anyOf ? probe.anyOf.some((p) => can(role, p)) : hasGate(caller, gate);
  const named = probe.anyOf ? `any of ${probe.anyOf.join(", ")}` : gate;
  // At a stage where nobody may do this (a signed case), "read-only" (409) is as true an answer as 403.
  const nobodyMay = Boolean(stage && probe.stageAllows && !probe.stageAllows(stage, "admin"));
  if (!permitted)
    return status === 403 || (!reachable && status === 404) || (nobodyMay && status === 409)
      ? null
      : `lacks ${named} but got ${status}, expected 403`;
  if (!reachable) return status === 404 ? null : `may not read the case but got ${status}, expected 404`;
  if (probe.anyOf) return status === 401 || status === 403 || status === 404 ? `allowed (${named}) but got ${status}` : null;
  if (aimedAtNoId) return status === 401 || status === 403 ? `allowed (${named}) but refused with ${status}` : null;
  if (stage && probe.stageAllows && !probe.stageAllows(stage, role)) {
    return status === 403 || status === 409 ? null : `stage ${stage} forbids this, got ${status}, expected 403 or 409`;
  }
  if (status === 401 || status === 403) return `allowed (${named}) but refused with ${status}`;
  // Routes without a case are probed at ids that exist nowhere (role-guards' probes), so 404 is their answer.
  if (status === 404 && stage && !probe.missingTarget) return `allowed (${named}) but got 404`;
  return null;
}

function fill(route: string, c: ProbeCase | null): string {
  return route.replace(/\[([^\]]+)\]/g, (_, name: string) => {
    if (c && name === "id") return c.id;
    if (c && name === "findingId") return c.findingId;
    if (c && name === "photoId") return c.photoId;
    if (name === "...all") return "get-session";
    return SAMPLE_PARAMS[name];
  });
}

describe("access matrix: the rows", () => {
  it("has a rule for every route method and none for a route that is gone", () => {
    const keys = routeKeys();
    expect(
      keys.filter((k) => !(k in ROUTE_RULES)),
      "routes without a rule in ROUTE_RULES",
    ).toEqual([]);
    expect(
      Object.keys(ROUTE_RULES).filter((k) => !keys.includes(k)),
      "rules for routes that no longer exist",
    ).toEqual([]);
  });

  it("has a rule for every page and none for a page that is gone", () => {
    const pages = pagePatterns();
    expect(
      pages.filter((p) => !(p in PAGE_RULES)),
      "pages without a rule in PAGE_RULES",
    ).toEqual([]);
    expect(
      Object.keys(PAGE_RULES).filter((p) => !pages.includes(p)),
      "rules for pages that no longer exist",
    ).toEqual([]);
  });

  it("names every permission of lib/auth/permissions.ts in some route or page rule", () => {
    const named = new Set<string>(REACH_PERMISSIONS);
    for (const rule of Object.values(ROUTE_RULES)) {
      named.add(rule.gate);
      for (const p of rule.probes ?? []) if (p.permission) named.add(p.permission);
    }
    for (const rule of Object.values(PAGE_RULES)) named.add(rule.gate);
    const unnamed = (Object.keys(PERMISSIONS) as Permission[]).filter((p) => !named.has(p));
    expect(unnamed, "permissions no route or page exercises: give them a rule").toEqual([]);
  });

  it("agrees with the hand-written role table where a route has one permission", () => {
    const drift: string[] = [];
    for (const [key, rule] of Object.entries(ROUTE_RULES)) {
      const access = ROUTE_TABLE[key]?.access;
      if (!Array.isArray(access) || rule.gate === "public" || rule.gate === "signed-in" || rule.probes?.some((p) => p.permission)) continue;
      const byPermission = (["inspector", "analyst", "engineer", "manager", "admin"] as Role[]).filter((r) =>
        can(r, rule.gate as Permission),
      );
      if ([...access].sort().join() !== byPermission.sort().join())
        drift.push(`${key}: table ${access.join("/")}, permissions ${byPermission.join("/")}`);
    }
    expect(drift).toEqual([]);
  });
});

describe("access matrix: API routes", () => {
  for (const [key, rule] of Object.entries(ROUTE_RULES)) {
    const [method, route] = key.split(" ");
    const stages: (Stage | null)[] = rule.reach === "none" ? [null] : [...STAGES];
    it(`${key} answers every caller${rule.reach === "none" ? "" : " in every stage"} as the permissions say, and leaks no case number`, async () => {
      const problems: string[] = [];
      for (const stage of stages) {
        const target = stage ? targets.get(stage)! : null;
        const probes: MatrixProbe[] = rule.probes ?? [{}];
        for (const probe of probes) {
          const gate = probe.permission ?? rule.gate;
          for (const caller of callers) {
            const reachable = !target || (caller.viewer !== null && canReadCase(caller.viewer, target));
            const useNoId = Boolean(probe.allowedUseNoId && caller.viewer && hasGate(caller, gate) && reachable);
            const aim = target && useNoId ? { ...target, id: NO_ID, photoId: NO_ID, findingId: NO_ID } : target;
            // Routes without a case keep the role table's probe paths and bodies (which change nothing).
            const tableProbes = !target ? (ROUTE_TABLE[key]?.probes ?? [{}]) : [{}];
            for (const tp of tableProbes) {
              const path = tp.path ?? fill(route, aim) + (probe.query && aim ? probe.query(aim) : "");
              const sends = method !== "GET" && method !== "DELETE";
              const body = probe.body && aim ? probe.body(aim) : (tp.body ?? (sends ? {} : undefined));
              const res = await caller.client.request(method, path, body);
              const text = await bodyText(res);
              const where = `${method} ${path.replace(target?.id ?? "\u0000", `<${stage} case>`)}${probe.label ? ` (${probe.label})` : ""} as ${caller.who}`;
              const wrong = apiProblem(caller, gate, reachable, probe, stage, res.status, Boolean(useNoId));
              if (wrong) problems.push(`${where}: ${wrong}`);
              const leaked = leaks(caller, text, path);
              if (leaked.length) problems.push(`${where}: body shows case ${leaked.join(", ")} the caller may not read`);
            }
          }
        }
      }
      expect(problems).toEqual([]);
    }, 180_000);
  }
});

describe("access matrix: pages", () => {
  for (const [pattern, rule] of Object.entries(PAGE_RULES)) {
    const stages: (Stage | null)[] = rule.reach === "none" ? [null] : [...STAGES];
    it(`${pattern} answers every caller as the permissions say, and leaks no case number`, async () => {
      const problems: string[] = [];
      for (const stage of stages) {
        const target = stage ? targets.get(stage)! : null;
        const path = pattern.replace("[number]", target?.number ?? "").replace("[token]", "no-such-invitation-token") + (rule.query ?? "");
        for (const caller of callers) {
          const res = await caller.client.request("GET", path);
          const text = await bodyText(res);
          const where = `GET ${path} as ${caller.who}`;
          const to = res.headers.get("location") ?? "";
          const reachable = !target || (caller.viewer !== null && canReadCase(caller.viewer, target));
          let wrong: string | null = null;
          if (res.status >= 500) wrong = `server error ${res.status}`;
          else if (rule.gate === "public" || rule.gate === "anonymous-only") wrong = null;
          else if (!caller.viewer)
            wrong =
              res.status >= 300 && res.status < 400 && to.includes("/sign-in")
                ? null
                : `anonymous got ${res.status} ${to}, expected a redirect to sign-in`;
          else if (!hasGate(caller, rule.gate))
            wrong =
              res.status >= 300 && res.status < 400 && to.includes("/forbidden")
                ? null
                : `lacks ${rule.gate} but got ${res.status} ${to}, expected the refusal page`;
          else if (!reachable) wrong = res.status === 404 ? null : `may not read ${target!.number} but got ${res.status}, expected 404`;
          else if (res.status !== 200) wrong = `allowed but got ${res.status} ${to}`;
          if (wrong) problems.push(`${where}: ${wrong}`);
          const leaked = leaks(caller, text, path);
          if (leaked.length) problems.push(`${where}: page shows case ${leaked.join(", ")} the caller may not read`);
        }
      }
      expect(problems).toEqual([]);
    }, 180_000);
  }
});
