// PATCH /api/admin/users/:id - change a person's role (and home site)
import { NextResponse } from "next/server";
import { z } from "@/lib/validation/zod";
import { LastAdminError, setRoleIn, withAdminsLocked } from "@/db/queries/admin-guard";
import { getUserById, setUserSite } from "@/db/queries/users";
import { badRequest, HttpError, notFound } from "@/lib/http/errors";
import { parseJson, withRole } from "@/lib/http/handler";
import { audit } from "@/lib/security/audit";
import { roleSchema } from "@/lib/validation/account";

const patchSchema = z
  .object({ role: roleSchema.optional(), siteId: z.string().uuid("Choose a site from the list.").nullable().optional() })
  .refine((v) => v.role !== undefined || v.siteId !== undefined, "Send a role or a site to change.");

export const PATCH = withRole<{ id: string }>("admin:users", async ({ req, params, user }) => {
  const body = await parseJson(req, patchSchema);
  const target = await getUserById(params.id);
  if (!target) throw notFound("That user");
  if (target.id === user.id && body.role && body.role !== "admin") {
    throw badRequest("You cannot take away your own admin role; ask another admin.");
  }
  if (body.role && body.role !== target.role) {
    const role = body.role;
    try {
      await withAdminsLocked(target.id, role !== "admin", async (tx) => {
        await setRoleIn(tx, target.id, role);
        await audit("role-change", user, { subject: target.email, headers: req.headers, detail: { from: target.role, to: role }, tx });
      });
    } catch (err) {
      if (err instanceof LastAdminError) throw new HttpError(409, "last-admin", "This is the last administrator; make someone else an administrator first.");
      throw err;
    }
  }
  if (body.siteId !== undefined && body.siteId !== target.siteId) {
    await setUserSite(target.id, body.siteId);
    await audit("site-change", user, { subject: target.email, headers: req.headers, detail: { from: target.siteId, to: body.siteId } });
  }
  return NextResponse.json({ user: await getUserById(target.id) });
});
