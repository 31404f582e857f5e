// Who may call each API route: the product's access rules written out by hand, one row per method.
// role-guards.test.ts checks every row against the running app and fails when a route file has no row.
import type { DemoRole } from "../../support/api";
import type { Permission, Role } from "../../../lib/auth/permissions";
import { ACTIONS, WORKFLOW, canEditSection, type WorkflowAction } from "../../../lib/cases/workflow";
import type { Stage } from "../../../lib/cases/stages";

// "disabled": the auth library's endpoint is switched off (404 for everyone); Tearline's own routes do that job.
export type Access = "public" | "disabled" | readonly DemoRole[];
export type Probe = { path?: string; body?: unknown; access?: Access; note?: string };
export type RouteRow = { access: Access; probes?: Probe[] };

const EVERYONE = ["inspector", "analyst", "engineer", "manager", "admin"] as const;
const ADMIN = ["admin"] as const;
const FILES_REMOVALS = ["inspector", "analyst", "admin"] as const; // file removals, upload and tag photos
const TEARDOWN = ["analyst", "admin"] as const;
const LINKS = ["engineer", "admin"] as const;
const EXPORTS = ["analyst", "engineer", "manager", "admin"] as const;
const FLEET = ["engineer", "manager", "admin"] as const;
const EDITS_A_SECTION = ["inspector", "analyst", "admin"] as const; // case:edit-field, case:edit-teardown or case:propose
const TAKES_A_STEP = ["analyst", "engineer", "admin"] as const; // any workflow step's permission

/** A case, finding or photo id that exists nowhere: probes never change real records. */
export const NO_ID = "00000000-0000-4000-8000-000000000000";

export const SAMPLE_PARAMS: Record<string, string> = {
  id: NO_ID,
  findingId: NO_ID,
  photoId: NO_ID,
  variant: "thumb",
  list: "damage",
  code: "fatigue.no-such-code",
};

export const ROUTE_TABLE: Record<string, RouteRow> = {
  // Accounts and the auth library's own endpoints (sign-in is public; its admin endpoints are admin-only).
  "GET /api/auth/[...all]": {
    access: "public",
    probes: [{ path: "/api/auth/get-session" }, { path: "/api/auth/admin/list-users", access: ADMIN }],
  },
  "POST /api/auth/[...all]": {
    access: "public",
    probes: [
      { path: "/api/auth/sign-in/email", body: {} },
      { path: "/api/auth/admin/set-role", body: { userId: "nobody", role: "admin" }, access: "disabled" },
      { path: "/api/auth/admin/ban-user", body: { userId: "nobody" }, access: ADMIN },
      { path: "/api/auth/admin/remove-user", body: { userId: "nobody" }, access: "disabled" },
      { path: "/api/auth/admin/impersonate-user", body: { userId: "nobody" }, access: "disabled" },
      { path: "/api/auth/admin/set-user-password", body: { userId: "nobody", newPassword: "x" }, access: "disabled" },
      // An unknown role makes the admin's call fail after the role check, so no account is created.
      {
        path: "/api/auth/admin/create-user",
        body: { email: "guard-probe@sable-river.example", password: "long-enough-password", name: "Guard Probe", role: "no-such-role" },
        access: "disabled",
      },
    ],
  },
  "POST /api/invitations/accept": { access: "public" },
  "GET /api/health": { access: "public" },
  "GET /api/me/notices": { access: EVERYONE },
  "PATCH /api/me/notices": { access: EVERYONE },

  // Administration.
  "GET /api/admin/invitations": { access: ADMIN },
  "POST /api/admin/invitations": { access: ADMIN },
  "DELETE /api/admin/invitations/[id]": { access: ADMIN },
  "PATCH /api/admin/users/[id]": { access: ADMIN },
  "POST /api/admin/users/[id]/suspend": { access: ADMIN },
  "DELETE /api/admin/users/[id]/suspend": { access: ADMIN },
  "POST /api/admin/users/[id]/unlock": { access: ADMIN },
  "GET /api/admin/audit": { access: ADMIN },
  "GET /api/admin/sites": { access: ADMIN },
  "POST /api/admin/sites": { access: ADMIN },
  "PATCH /api/admin/sites/[id]": { access: ADMIN },
  "DELETE /api/admin/sites/[id]": { access: ADMIN },
  "GET /api/admin/codes": { access: ADMIN, probes: [{ path: "/api/admin/codes?list=damage" }] },
  "POST /api/admin/codes": { access: ADMIN },
  "PATCH /api/admin/codes/[list]/[code]": { access: ADMIN },
  "DELETE /api/admin/codes/[list]/[code]": { access: ADMIN },
  "POST /api/admin/outbox/retry": { access: ADMIN },
  // A body the digest refuses, so the probe sends no mail.
  "POST /api/digest": { access: ADMIN, probes: [{ body: { unexpected: true } }] },

  // Pickers any signed-in person needs.
  "GET /api/sites": { access: EVERYONE },
  "GET /api/codes": { access: EVERYONE, probes: [{ path: "/api/codes?list=damage" }] },

  // Cases. Stage and section rules are checked inside the handlers (tests/api/cases); here only who may knock.
  "GET /api/cases": { access: EVERYONE },
  "POST /api/cases": { access: FILES_REMOVALS },
  "GET /api/cases/export": { access: EVERYONE },
  "GET /api/cases/[id]": { access: EVERYONE },
  "PATCH /api/cases/[id]": { access: EDITS_A_SECTION },
  "POST /api/cases/[id]/transitions": { access: TAKES_A_STEP },
  "GET /api/cases/[id]/history": { access: EVERYONE },
  "GET /api/cases/[id]/signature": { access: EVERYONE },
  "POST /api/cases/[id]/signature": { access: LINKS },
  "POST /api/cases/[id]/findings": { access: TEARDOWN },
  "PATCH /api/cases/[id]/findings/[findingId]": { access: TEARDOWN },
  "DELETE /api/cases/[id]/findings/[findingId]": { access: TEARDOWN },
  "GET /api/cases/[id]/links": { access: EVERYONE },
  "POST /api/cases/[id]/links": { access: LINKS },
  "DELETE /api/cases/[id]/links": { access: LINKS, probes: [{ path: `/api/cases/${NO_ID}/links?relatedId=${NO_ID}` }] },
  "GET /api/cases/[id]/similar": { access: EVERYONE },
  "GET /api/cases/[id]/report.pdf": { access: EVERYONE },
  "GET /api/cases/[id]/evidence.zip": { access: EXPORTS },
  "GET /api/cases/[id]/photos": { access: EVERYONE },
  "POST /api/cases/[id]/photos": { access: FILES_REMOVALS },
  "GET /api/photos/[photoId]/[variant]": { access: EVERYONE },
  "PATCH /api/photos/[photoId]": { access: FILES_REMOVALS },
  "DELETE /api/photos/[photoId]": { access: FILES_REMOVALS },
  "GET /api/search": { access: EVERYONE },

  // Tallies and life statistics: everyone reads (inspectors their own shop's); fleet lists come from engineering.
  "GET /api/tallies": { access: EVERYONE },
  "GET /api/tallies/life": { access: EVERYONE },
  "GET /api/tallies/yield": { access: EVERYONE },
  "GET /api/fleet": { access: EVERYONE },
  "POST /api/fleet": { access: FLEET },
};

// ---------------------------------------------------------------------------------------------
// The same routes as the permissions module names them, for the access matrix
// (tests/api/security/access-matrix.test.ts). Each row says which permission the route exercises
// and what it reaches: "case" routes resolve [id] to a case, "photo" routes a photo's case.
// A permission in lib/auth/permissions.ts that no row names (and that is not a reach-widener
// below) fails the matrix, as does a route file without a row.

export type Gate = Permission | "public" | "signed-in";
export type Reach = "case" | "photo" | "none";
/** One call the matrix makes; `permission` overrides the row's when the body names the act (a section, a step). */
export type MatrixProbe = {
  label?: string;
  permission?: Gate;
  body?: (ctx: ProbeCase) => unknown;
  query?: (ctx: ProbeCase) => string;
  /** Stage rule on top of the permission: false means nobody may do this at that stage (refusal 403/409 is right). */
  stageAllows?: (stage: Stage, role: Role) => boolean;
  /** Destructive with no harmless body: allowed callers aim at an id that exists nowhere instead. */
  allowedUseNoId?: boolean;
  /** The probe names a sub-resource that is not there (a link to itself), so a permitted caller may get 404. */
  missingTarget?: boolean;
  /** The act is any of these (a body the route cannot read names none): callers with none of them get 403 before the body is read. */
  anyOf?: Permission[];
};
export type ProbeCase = { id: string; number: string; version: number; stage: Stage; findingId: string; photoId: string };
export type RouteRule = { gate: Gate; reach: Reach; probes?: MatrixProbe[] };

/** Permissions that widen what a permitted person reaches, rather than open an entry point. */
export const REACH_PERMISSIONS: Permission[] = ["case:read-all", "tallies:read-all"];

const STALE = 999_999; // a version no case reaches in a test run: a permitted save is refused as stale, nothing changes
const sectionProbe = (
  section: "field" | "teardown" | "verdict",
  permission: Permission,
  stageAllows: MatrixProbe["stageAllows"],
): MatrixProbe => ({
  label: `section ${section}`,
  permission,
  body: () => ({ version: STALE, section, data: {} }),
  stageAllows,
});
const stepProbe = (action: WorkflowAction): MatrixProbe => ({
  label: `step ${action}`,
  permission: WORKFLOW[action].permission,
  body: () => ({ version: STALE, action, reason: "Access matrix probe, never applied." }),
  stageAllows: (stage) => WORKFLOW[action].from.includes(stage),
});
/** A body no handler can read: a caller without the route's permission must hear 403, not a complaint about the body. */
const unreadable = (label: string, anyOf: Permission[]): MatrixProbe => ({ label, anyOf, body: () => ({ unexpected: "matrix probe" }) });
const notSigned = (stage: Stage) => stage !== "signed";
const teardownOpen = (stage: Stage, role: Role) => canEditSection("teardown", stage, role);

export const ROUTE_RULES: Record<string, RouteRule> = {
  "GET /api/auth/[...all]": { gate: "public", reach: "none" },
  "POST /api/auth/[...all]": { gate: "public", reach: "none" },
  "POST /api/invitations/accept": { gate: "public", reach: "none" },
  "GET /api/health": { gate: "public", reach: "none" },
  "GET /api/me/notices": { gate: "signed-in", reach: "none" },
  "PATCH /api/me/notices": { gate: "signed-in", reach: "none" },

  "GET /api/admin/invitations": { gate: "admin:users", reach: "none" },
  "POST /api/admin/invitations": { gate: "admin:users", reach: "none" },
  "DELETE /api/admin/invitations/[id]": { gate: "admin:users", reach: "none" },
  "PATCH /api/admin/users/[id]": { gate: "admin:users", reach: "none" },
  "POST /api/admin/users/[id]/suspend": { gate: "admin:users", reach: "none" },
  "DELETE /api/admin/users/[id]/suspend": { gate: "admin:users", reach: "none" },
  "POST /api/admin/users/[id]/unlock": { gate: "admin:users", reach: "none" },
  "GET /api/admin/audit": { gate: "admin:audit", reach: "none" },
  "GET /api/admin/sites": { gate: "admin:sites", reach: "none" },
  "POST /api/admin/sites": { gate: "admin:sites", reach: "none" },
  "PATCH /api/admin/sites/[id]": { gate: "admin:sites", reach: "none" },
  "DELETE /api/admin/sites/[id]": { gate: "admin:sites", reach: "none" },
  "GET /api/admin/codes": { gate: "admin:codes", reach: "none" },
  "POST /api/admin/codes": { gate: "admin:codes", reach: "none" },
  "PATCH /api/admin/codes/[list]/[code]": { gate: "admin:codes", reach: "none" },
  "DELETE /api/admin/codes/[list]/[code]": { gate: "admin:codes", reach: "none" },
  "POST /api/admin/outbox/retry": { gate: "admin:outbox", reach: "none" },
  "POST /api/digest": { gate: "digest:send", reach: "none" },

  "GET /api/sites": { gate: "signed-in", reach: "none" },
  "GET /api/codes": { gate: "signed-in", reach: "none" },

  "GET /api/cases": { gate: "case:read", reach: "none" },
  "POST /api/cases": { gate: "case:create", reach: "none" },
  "GET /api/cases/export": { gate: "case:read", reach: "none" },
  "GET /api/search": { gate: "case:read", reach: "none" },
  "GET /api/cases/[id]": { gate: "case:read", reach: "case" },
  "PATCH /api/cases/[id]": {
    gate: "case:read", // the section in the body names the permission (probes below)
    reach: "case",
    probes: [
      sectionProbe("field", "case:edit-field", (stage, role) => canEditSection("field", stage, role)),
      sectionProbe("teardown", "case:edit-teardown", (stage, role) => canEditSection("teardown", stage, role)),
      sectionProbe("verdict", "case:propose", (stage, role) => canEditSection("verdict", stage, role)),
      unreadable("no section named", ["case:edit-field", "case:edit-teardown", "case:propose"]),
    ],
  },
  "POST /api/cases/[id]/transitions": {
    gate: "case:read",
    reach: "case", // Signing is its own route (POST /api/cases/[id]/signature); here it is refused as a step.
    probes: [
      ...ACTIONS.filter((a) => a !== "sign").map(stepProbe),
      unreadable(
        "no step named",
        ACTIONS.map((a) => WORKFLOW[a].permission),
      ),
    ],
  },
  "GET /api/cases/[id]/history": { gate: "case:read", reach: "case" },
  "GET /api/cases/[id]/signature": { gate: "case:read", reach: "case" },
  // A stale version is refused before the password is checked, so a permitted probe signs nothing.
  "POST /api/cases/[id]/signature": {
    gate: "case:sign",
    reach: "case",
    probes: [
      {
        body: () => ({ version: STALE, password: "matrix probe", contentHash: "0".repeat(64), meaningAccepted: true }),
        stageAllows: (stage) => stage === "signoff",
      },
    ],
  },
  "POST /api/cases/[id]/findings": {
    gate: "case:edit-teardown",
    reach: "case",
    probes: [
      {
        body: () => ({ version: STALE, finding: { component: "cup", damageCode: "fatigue.subsurface", severity: 3 } }),
        stageAllows: teardownOpen,
      },
    ],
  },
  "PATCH /api/cases/[id]/findings/[findingId]": {
    gate: "case:edit-teardown",
    reach: "case",
    probes: [{ body: () => ({ version: STALE, finding: {} }), stageAllows: teardownOpen }],
  },
  "DELETE /api/cases/[id]/findings/[findingId]": {
    gate: "case:edit-teardown",
    reach: "case",
    probes: [{ query: () => `?version=${STALE}`, stageAllows: teardownOpen }],
  },
  "GET /api/cases/[id]/links": { gate: "case:read", reach: "case" },
  // Linking a case to itself is refused after the access checks, so a permitted probe changes nothing.
  "POST /api/cases/[id]/links": {
    gate: "case:link",
    reach: "case",
    probes: [{ body: (c) => ({ relatedId: c.id, note: "matrix probe" }) }],
  },
  "DELETE /api/cases/[id]/links": {
    gate: "case:link",
    reach: "case",
    probes: [{ query: (c) => `?relatedId=${c.id}`, missingTarget: true }],
  },
  "GET /api/cases/[id]/similar": { gate: "case:read", reach: "case" },
  "GET /api/cases/[id]/report.pdf": { gate: "case:read", reach: "case" },
  "GET /api/cases/[id]/evidence.zip": { gate: "case:export", reach: "case" },
  "GET /api/cases/[id]/photos": { gate: "case:read", reach: "case" },
  // A form without a file: refused after the access checks.
  "POST /api/cases/[id]/photos": {
    gate: "photo:upload",
    reach: "case",
    probes: [
      {
        body: () => {
          const f = new FormData();
          f.set("caption", "matrix probe");
          return f;
        },
        stageAllows: notSigned,
      },
    ],
  },
  "GET /api/photos/[photoId]/[variant]": { gate: "case:read", reach: "photo" },
  // A finding of no case: refused after the photo is found and its case checked.
  "PATCH /api/photos/[photoId]": {
    gate: "photo:upload",
    reach: "photo",
    probes: [{ body: () => ({ findingId: NO_ID }), stageAllows: notSigned }],
  },
  "DELETE /api/photos/[photoId]": { gate: "photo:delete", reach: "photo", probes: [{ allowedUseNoId: true, stageAllows: notSigned }] },

  "GET /api/tallies": { gate: "tallies:read", reach: "none" },
  "GET /api/tallies/life": { gate: "tallies:read", reach: "none" },
  "GET /api/tallies/yield": { gate: "tallies:read", reach: "none" },
  "GET /api/fleet": { gate: "tallies:read", reach: "none" },
  "POST /api/fleet": { gate: "fleet:upload", reach: "none" },
};

/** Every page under app/, keyed by its URL pattern (route groups dropped), with the permission it asks for. */
export const PAGE_RULES: Record<string, { gate: Gate | "anonymous-only"; reach: "case" | "none"; query?: string }> = {
  "/": { gate: "signed-in", reach: "none" },
  "/cases": { gate: "case:read", reach: "none" },
  "/cases/new": { gate: "case:create", reach: "none" },
  "/cases/[number]": { gate: "case:read", reach: "case" },
  "/cases/[number]/photos": { gate: "case:read", reach: "case" },
  "/cases/[number]/report": { gate: "case:read", reach: "case" },
  "/search": { gate: "case:read", reach: "none", query: "?q=bearing" },
  "/photos/compare": { gate: "case:read", reach: "none" },
  "/tallies": { gate: "tallies:read", reach: "none" },
  "/tallies/life": { gate: "tallies:read", reach: "none" },
  "/tallies/yield": { gate: "tallies:read", reach: "none" },
  "/reference": { gate: "signed-in", reach: "none" },
  "/profile": { gate: "signed-in", reach: "none" },
  "/admin/users": { gate: "admin:users", reach: "none" },
  "/admin/sites": { gate: "admin:sites", reach: "none" },
  "/admin/codes": { gate: "admin:codes", reach: "none" },
  "/admin/outbox": { gate: "admin:outbox", reach: "none" },
  "/admin/audit": { gate: "admin:audit", reach: "none" },
  "/forbidden": { gate: "public", reach: "none" },
  // Served by proxy.ts with 503 in place of any page while the database is away; asked for directly, it sends home.
  "/unavailable": { gate: "public", reach: "none" },
  "/sign-in": { gate: "public", reach: "none" },
  "/forgot-password": { gate: "public", reach: "none" },
  "/reset-password": { gate: "public", reach: "none" },
  "/invitation/[token]": { gate: "public", reach: "none" },
};
