// Who may call each API route: the product's access rules written out by hand, one row per method.
// role-guards.test.ts checks every row against the running app and fails when a route file has no row.
import type { DemoRole } from "../../support/api";

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
    probes: [
      { path: "/api/auth/get-session" },
      { path: "/api/auth/admin/list-users", access: ADMIN },
    ],
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
      { path: "/api/auth/admin/create-user", body: { email: "guard-probe@sable-river.example", password: "long-enough-password", name: "Guard Probe", role: "no-such-role" }, access: "disabled" },
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
  "PATCH /api/cases/[id]": { access: EVERYONE },
  "POST /api/cases/[id]/transitions": { access: EVERYONE },
  "GET /api/cases/[id]/history": { access: EVERYONE },
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
  "GET /api/fleet": { access: EVERYONE },
  "POST /api/fleet": { access: FLEET },
};
