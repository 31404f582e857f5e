// Property tests on every route that takes input: random and malformed JSON, query strings, path ids,
// multipart forms and files. Every answer is below 500; every refusal is a 4xx whose JSON names the
// problem in `error`; and a refused request changes nothing (row counts and a hash of each table the
// API writes are equal before and after). Runs are seeded: FC_SEED=<n> repeats a run, and a failure
// prints the seed and the shrunk request.
import fc from "fast-check";
import { beforeAll, describe, it } from "vitest";
import { ApiClient, as } from "../../support/api";
import { changedTables, tableState } from "../../support/db";
import { createCase } from "../../support/factories";
import { smallPng } from "../../support/photo-files";
import { freshPerson } from "../admin/fresh-person";

const SEED = Number(process.env.FC_SEED ?? 20261203);
const RUNS = Number(process.env.FC_RUNS ?? 40); // modest: the whole suite must stay well inside its time on 2 cores

type Ids = { caseId: string; caseNumber: string; findingId: string; photoId: string; userId: string; siteId: string };
let ids: Ids;
let admin: ApiClient;
let inspector: ApiClient;

beforeAll(async () => {
  admin = await as("admin");
  inspector = await as("inspector");
  const c = await createCase({ status: "bench", findings: [{ component: "cup", damageCode: "fatigue.subsurface", severity: 3 }] });
  const form = new FormData();
  form.set("file", new Blob([new Uint8Array(await smallPng(77))], { type: "image/png" }), "fuzz.png");
  const up = await admin.request("POST", `/api/cases/${c.id}/photos`, form);
  if (up.status !== 201) throw new Error(`photo for the fuzz case: ${up.status}`);
  const photoId = ((await up.json()) as { photo: { id: string } }).photo.id;
  const { findingId } = await (await import("../../support/db")).pool
    .query<{ findingId: string }>(`select id as "findingId" from findings where case_id = $1`, [c.id])
    .then((r) => r.rows[0]);
  const person = await freshPerson("analyst", "Fuzz Target");
  const site = await admin.json<{ sites: { id: string }[] }>("GET", "/api/admin/sites");
  ids = { caseId: c.id, caseNumber: c.number, findingId, photoId, userId: person.id, siteId: site.body.sites[0].id };
}, 120_000);

// Values people and programs really send: the JSON kinds, odd strings, huge and negative numbers.
const oddString = fc.oneof(
  fc.string({ maxLength: 40 }),
  fc.constantFrom(
    "",
    " ",
    "null",
    "undefined",
    "<script>x</script>",
    "' or 1=1 --",
    "../../etc/passwd",
    "\u0000",
    "💥",
    "9".repeat(400),
    "TL-26-00001",
    "00000000-0000-4000-8000-000000000000",
    "not-a-uuid",
  ),
  fc.string({ unit: "binary", maxLength: 20 }),
);
const oddNumber = fc.oneof(fc.integer(), fc.double({ noNaN: false }), fc.constantFrom(0, -1, 1e308, Number.MAX_SAFE_INTEGER, 999_999));
const leaf = fc.oneof(oddString, oddNumber, fc.boolean(), fc.constant(null));
const anyJson = fc.oneof(fc.jsonValue({ maxDepth: 3 }), leaf, fc.array(leaf, { maxLength: 5 }));

/** An object that has some of the keys a route reads, each with a value of the wrong kind or an odd one. */
function nearValid(keys: string[]) {
  return fc.dictionary(
    fc.constantFrom(...keys, "unexpected"),
    fc.oneof(leaf, anyJson, fc.dictionary(fc.constantFrom(...keys), leaf, { maxKeys: 3 })),
    { maxKeys: keys.length + 1 },
  );
}
/** Bodies as sent: parsed JSON of any shape, or text that is not JSON at all. */
function jsonBodies(keys: string[]) {
  return fc.oneof(
    nearValid(keys).map((o) => JSON.stringify(o)),
    anyJson.map((v) => JSON.stringify(v)),
    fc.oneof(fc.string({ maxLength: 60 }), fc.constantFrom("{", '{"a":', "[1,2", "nul", "{'single':1}", "\uFEFF{}", "{}}")),
  );
}

type Sent = { method: string; path: string; body?: string | FormData; type?: string };

/** The check every answer must pass; returns what was wrong, or null. */
async function send(client: ApiClient, req: Sent): Promise<string | null> {
  const before = await tableState();
  const headers: Record<string, string> = req.type ? { "content-type": req.type } : {};
  const res = await client.request(req.method, req.path, req.body, headers);
  const text = await res.text();
  if (res.status >= 500) return `server error ${res.status}: ${text.slice(0, 200)}`;
  if (res.status < 400) return null; // the input happened to be valid; a write is then allowed to change things
  let error: unknown;
  try {
    error = (JSON.parse(text) as { error?: unknown }).error;
  } catch {
    return `${res.status} without a JSON body: ${text.slice(0, 120)}`;
  }
  if (typeof error !== "string" || error.trim().length < 3) return `${res.status} without an error message: ${text.slice(0, 120)}`;
  const changed = changedTables(before, await tableState());
  return changed.length ? `refused with ${res.status} but changed ${changed.join(", ")}` : null;
}

async function holds(name: string, client: () => ApiClient, arb: fc.Arbitrary<Sent>, runs = RUNS) {
  const problems: string[] = [];
  await fc
    .assert(
      fc.asyncProperty(arb, async (req) => {
        const wrong = await send(client(), req);
        if (wrong) problems.push(`${req.method} ${req.path}: ${wrong}`);
        return wrong === null;
      }),
      { seed: SEED, numRuns: runs, endOnFailure: true },
    )
    .catch((err: Error) => {
      throw new Error(`${name} (FC_SEED=${SEED}): ${problems[0] ?? ""}\n${err.message.split("\n").slice(0, 6).join("\n")}`);
    });
}

const json = (method: string, path: () => string, keys: string[]): fc.Arbitrary<Sent> =>
  jsonBodies(keys).map((body) => ({ method, path: path(), body, type: "application/json" }));

const queries = (path: string, keys: string[]): fc.Arbitrary<Sent> =>
  fc.dictionary(fc.constantFrom(...keys, "x", "page", ""), fc.oneof(oddString, oddNumber.map(String)), { maxKeys: 5 }).map((q) => ({
    method: "GET",
    path: `${path}?${new URLSearchParams(q).toString()}`,
  }));

const JSON_ROUTES: Array<[string, string, () => string, string[], "admin" | "inspector"]> = [
  [
    "file a removal",
    "POST",
    () => "/api/cases",
    ["trigger", "siteId", "removedOn", "serial", "bearingClass", "carMark", "carNumber", "axle", "side", "fieldChecks", "mountedOn"],
    "inspector",
  ],
  ["save a section", "PATCH", () => `/api/cases/${ids.caseId}`, ["version", "section", "data"], "admin"],
  ["take a step", "POST", () => `/api/cases/${ids.caseId}/transitions`, ["version", "action", "reason", "labSiteId"], "admin"],
  [
    "sign a verdict",
    "POST",
    () => `/api/cases/${ids.caseId}/signature`,
    ["version", "password", "contentHash", "meaningAccepted"],
    "admin",
  ],
  ["add a finding", "POST", () => `/api/cases/${ids.caseId}/findings`, ["version", "finding"], "admin"],
  ["change a finding", "PATCH", () => `/api/cases/${ids.caseId}/findings/${ids.findingId}`, ["version", "finding"], "admin"],
  ["link a case", "POST", () => `/api/cases/${ids.caseId}/links`, ["relatedId", "note"], "admin"],
  ["retag a photo", "PATCH", () => `/api/photos/${ids.photoId}`, ["component", "row", "clockDeg", "findingId", "caption"], "admin"],
  ["invite a person", "POST", () => "/api/admin/invitations", ["email", "name", "role", "siteId"], "admin"],
  ["change a person", "PATCH", () => `/api/admin/users/${ids.userId}`, ["role", "siteId", "name"], "admin"],
  [
    "add a site",
    "POST",
    () => "/api/admin/sites",
    ["code", "name", "kind", "railway", "location", "maxIn", "dialSpreadIn", "tapeSpreadIn"],
    "admin",
  ],
  [
    "change a site",
    "PATCH",
    () => `/api/admin/sites/${ids.siteId}`,
    ["name", "kind", "active", "maxIn", "dialSpreadIn", "tapeSpreadIn"],
    "admin",
  ],
  ["add a code", "POST", () => "/api/admin/codes", ["list", "code", "label", "family", "synonyms", "description"], "admin"],
  ["change a code", "PATCH", () => "/api/admin/codes/damage/fatigue.subsurface", ["label", "synonyms", "description", "retired"], "admin"],
  ["send the digest", "POST", () => "/api/digest", ["to", "period"], "admin"],
  ["accept an invitation", "POST", () => "/api/invitations/accept", ["token", "password", "name"], "admin"],
  ["switch notices", "PATCH", () => "/api/me/notices", ["signed", "returned", "awaiting", "digest"], "inspector"],
];

describe("random and malformed JSON bodies", () => {
  for (const [name, method, path, keys, who] of JSON_ROUTES) {
    it(`${name} (${method}) answers a 4xx with a message and changes nothing`, async () => {
      await holds(name, () => (who === "admin" ? admin : inspector), json(method, path, keys));
    }, 120_000);
  }
});

describe("random query strings", () => {
  const QUERY_ROUTES: Array<[string, string[]]> = [
    ["/api/cases", ["status", "trigger", "cause", "class", "site", "from", "to", "q", "sort", "pageSize"]],
    ["/api/cases/export", ["status", "trigger", "cause", "class", "site", "from", "to", "q", "sort"]],
    ["/api/search", ["q", "component", "damage", "cause", "site", "from", "to", "severity", "page"]],
    ["/api/tallies", ["from", "to", "site", "class", "group", "period"]],
    ["/api/tallies/life", ["from", "to", "site", "class", "cause", "component"]],
    ["/api/codes", ["list", "q", "includeRetired"]],
    ["/api/admin/codes", ["list", "q"]],
    ["/api/admin/audit", ["kind", "actor", "from", "to", "page", "q"]],
  ];
  for (const [path, keys] of QUERY_ROUTES) {
    it(`GET ${path} never fails on its query`, async () => {
      await holds(path, () => admin, queries(path, keys));
    }, 120_000);
  }
  it("DELETE a link or a finding with a random query answers a 4xx and changes nothing", async () => {
    const arb = fc.tuple(fc.constantFrom("links", "finding"), fc.oneof(oddString, oddNumber.map(String))).map(([what, v]) => ({
      method: "DELETE",
      path:
        what === "links"
          ? `/api/cases/${ids.caseId}/links?relatedId=${encodeURIComponent(v)}`
          : `/api/cases/${ids.caseId}/findings/${ids.findingId}?version=${encodeURIComponent(v)}`,
    }));
    await holds("delete with query", () => admin, arb);
  }, 120_000);
});

describe("random ids in the path", () => {
  const id = fc
    .oneof(
      oddString.filter((s) => s.length > 0),
      fc.uuid(),
    )
    .map((s) => encodeURIComponent(s));
  it("case, photo, finding, person, site and code ids that are not there answer 4xx and change nothing", async () => {
    const arb = fc
      .tuple(
        id,
        fc.constantFrom(
          (x: string) => ({ method: "GET", path: `/api/cases/${x}` }),
          (x: string) => ({ method: "GET", path: `/api/cases/${x}/report.pdf` }),
          (x: string) => ({ method: "GET", path: `/api/cases/${x}/evidence.zip` }),
          (x: string) => ({ method: "GET", path: `/api/cases/${x}/similar` }),
          (x: string) => ({ method: "GET", path: `/api/photos/${x}/thumb` }),
          (x: string) => ({ method: "GET", path: `/api/photos/${ids.photoId}/${x}` }),
          (x: string) => ({ method: "DELETE", path: `/api/photos/${x}` }),
          (x: string) => ({ method: "DELETE", path: `/api/cases/${ids.caseId}/findings/${x}?version=1` }),
          (x: string) => ({ method: "DELETE", path: `/api/admin/invitations/${x}` }),
          (x: string) => ({ method: "POST", path: `/api/admin/users/${x}/suspend`, body: "{}", type: "application/json" }),
          (x: string) => ({ method: "DELETE", path: `/api/admin/sites/${x}` }),
          (x: string) => ({ method: "DELETE", path: `/api/admin/codes/damage/${x}` }),
          (x: string) => ({ method: "PATCH", path: `/api/admin/codes/${x}/y`, body: "{}", type: "application/json" }),
        ),
      )
      .map(([x, make]) => make(x) as Sent);
    await holds("path ids", () => admin, arb, RUNS * 3);
  }, 240_000);
});

describe("random multipart forms and files", () => {
  const bytes = fc.oneof(
    fc.uint8Array({ maxLength: 2048 }),
    fc.constantFrom("png", "text").map((k) => k),
  );
  const part = fc.record({
    name: fc.constantFrom("file", "component", "row", "clockDeg", "findingId", "caption", "x"),
    value: fc.oneof(oddString, oddNumber.map(String)),
    asFile: fc.boolean(),
    fileName: fc.oneof(fc.constantFrom("photo.jpg", "list.csv", "", "../x.png", "a".repeat(300)), fc.string({ maxLength: 20 })),
    type: fc.constantFrom("image/jpeg", "image/png", "text/csv", "application/octet-stream", ""),
    bytes,
  });
  type Part = typeof part extends fc.Arbitrary<infer T> ? T : never;
  async function formOf(parts: Part[]) {
    const form = new FormData();
    for (const p of parts) {
      if (!p.asFile) form.append(p.name, p.value);
      else {
        const content =
          p.bytes === "png"
            ? new Uint8Array(await smallPng(9))
            : p.bytes === "text"
              ? new TextEncoder().encode("not,a,photo\n1,2,3")
              : new Uint8Array(p.bytes as Uint8Array);
        form.append(p.name, new Blob([content], { type: p.type }), p.fileName);
      }
    }
    return form;
  }
  for (const [label, path] of [
    ["photo upload", () => `/api/cases/${ids.caseId}/photos`],
    ["fleet list", () => "/api/fleet"],
  ] as const) {
    it(`${label} answers random forms with a 4xx and a message, and changes nothing when it refuses`, async () => {
      const problems: string[] = [];
      await fc
        .assert(
          fc.asyncProperty(fc.array(part, { maxLength: 4 }), async (parts) => {
            const body = await formOf(parts);
            const wrong = await send(admin, { method: "POST", path: path(), body });
            if (wrong) problems.push(wrong);
            return wrong === null;
          }),
          { seed: SEED, numRuns: RUNS, endOnFailure: true },
        )
        .catch((err: Error) => {
          throw new Error(`${label} (FC_SEED=${SEED}): ${problems[0] ?? ""}\n${err.message.split("\n").slice(0, 6).join("\n")}`);
        });
    }, 180_000);
  }
  it("fleet list as CSV text: random rows answer a 4xx with a message or are stored whole", async () => {
    const row = fc
      .array(
        fc.oneof(oddString, oddNumber.map(String)).map((s) => s.replace(/[\r\n]/g, " ")),
        { maxLength: 6 },
      )
      .map((cells) => cells.join(","));
    await holds(
      "fleet csv",
      () => admin,
      fc.array(row, { maxLength: 6 }).map((rows) => ({ method: "POST", path: "/api/fleet", body: rows.join("\n"), type: "text/csv" })),
    );
  }, 120_000);
});
