// Every API route refuses anonymous callers (401) and roles without the permission (403), and lets the
// allowed roles through to input checks (never 401/403, never a server error). A new route file without
// a row in route-table.ts fails this test, so access is decided for every route when it is written.
import { beforeAll, describe, expect, it } from "vitest";
import { ALL_ROLES, ApiClient, as, type DemoRole } from "../../support/api";
import { routeKeys } from "./route-files";
import { ROUTE_TABLE, SAMPLE_PARAMS, type Access, type Probe } from "./route-table";

type Caller = { who: DemoRole | "anonymous"; client: ApiClient };
const callers: Caller[] = [];

beforeAll(async () => {
  callers.push({ who: "anonymous", client: new ApiClient() });
  for (const role of ALL_ROLES) callers.push({ who: role, client: await as(role) });
});

function samplePath(route: string): string {
  return route.replace(/\[([^\]]+)\]/g, (_, name: string) => {
    if (!(name in SAMPLE_PARAMS)) throw new Error(`no sample value for [${name}] in ${route}; add one to SAMPLE_PARAMS`);
    return SAMPLE_PARAMS[name];
  });
}

/** What the table says should happen to one caller; null when the status is acceptable. */
function problem(access: Access, who: Caller["who"], status: number): string | null {
  if (access === "disabled") return status === 404 ? null : `disabled endpoint gave ${status}, expected 404`;
  if (access === "public") return status >= 500 || status === 401 || status === 403 ? `public route gave ${status}` : null;
  if (who === "anonymous") return status === 401 ? null : `anonymous got ${status}, expected 401`;
  if (!access.includes(who)) return status === 403 ? null : `${who} got ${status}, expected 403`;
  if (status === 401 || status === 403) return `${who} is allowed but got ${status}`;
  return status >= 500 ? `${who} is allowed but the server failed (${status})` : null;
}

describe("API role guards", () => {
  it("has a row for every route and method under app/api, and no row for a route that is gone", () => {
    const keys = routeKeys();
    expect(keys.length).toBeGreaterThan(10);
    const missing = keys.filter((k) => !(k in ROUTE_TABLE));
    const stale = Object.keys(ROUTE_TABLE).filter((k) => !keys.includes(k));
    expect(missing, "routes without an access row in tests/api/auth/route-table.ts").toEqual([]);
    expect(stale, "rows for routes that no longer exist").toEqual([]);
  });

  for (const [key, row] of Object.entries(ROUTE_TABLE)) {
    it(`${key} answers each caller as the table says`, async () => {
      const [method, route] = key.split(" ");
      const probes: Probe[] = row.probes ?? [{}];
      const problems: string[] = [];
      for (const probe of probes) {
        const path = probe.path ?? samplePath(route);
        const body = probe.body ?? (method === "POST" || method === "PATCH" || method === "PUT" ? {} : undefined);
        const access = probe.access ?? row.access;
        for (const { who, client } of callers) {
          const res = await client.request(method, path, body);
          await res.arrayBuffer();
          const wrong = problem(access, who, res.status);
          if (wrong) problems.push(`${method} ${path}: ${wrong}`);
        }
      }
      expect(problems).toEqual([]);
    });
  }
});
