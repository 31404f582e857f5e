// Wraps a handler under /api/cases/[id]: the caller's permission for this act is checked, then [id]
// is resolved to a case the caller may read (or 404) before the handler runs. Each write names
// the permission it exercises; an act that depends on the body (which section, which step) names
// the permissions it may need, and the service checks the exact one once the body is read.
import "server-only";
import type { NextRequest } from "next/server";
import type { Case } from "@/db/schema";
import { can, type Permission } from "@/lib/auth/permissions";
import type { CurrentUser } from "@/lib/auth/session";
import { loadReadableCase } from "@/lib/cases/service";
import { forbidden } from "./errors";
import { withRole } from "./handler";

type CaseCtx<P> = { req: NextRequest; user: CurrentUser; params: P; case: Case };

export function withCase<P extends { id: string } = { id: string }>(
  permission: Permission | readonly Permission[],
  handler: (ctx: CaseCtx<P>) => Promise<Response>,
) {
  const anyOf = typeof permission === "string" ? null : permission;
  return withRole<P>(anyOf ? "case:read" : (permission as Permission), async (ctx) => {
    if (anyOf && !anyOf.some((p) => can(ctx.user.role, p))) throw forbidden("Your role cannot change this case.");
    const c = await loadReadableCase(ctx.params.id, ctx.user);
    return handler({ ...ctx, case: c });
  });
}
