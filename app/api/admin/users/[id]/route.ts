// PATCH /api/admin/users/:id - change a person's role (and home site)
import { NextResponse } from "next/server";
import { z } from "zod";
import { getUserById, setUserRole, setUserSite } from "@/db/queries/users";
import { badRequest, notFound } from "@/lib/http/errors";
import { parseJson, withRole } from "@/lib/http/handler";
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
  if (body.role) await setUserRole(target.id, body.role);
  if (body.siteId !== undefined) await setUserSite(target.id, body.siteId);
  return NextResponse.json({ user: await getUserById(target.id) });
});
