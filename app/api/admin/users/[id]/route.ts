// PATCH /api/admin/users/:id - change a person's role (and home site)
import { NextResponse } from "next/server";
import { z } from "@/lib/validation/zod";
import { changePerson } from "@/lib/accounts/people-service";
import { parseJson, withRole } from "@/lib/http/handler";
import { roleSchema } from "@/lib/validation/account";

const patchSchema = z
  .object({ role: roleSchema.optional(), siteId: z.string().uuid("Choose a site from the list.").nullable().optional() })
  .refine((v) => v.role !== undefined || v.siteId !== undefined, "Send a role or a site to change.");

export const PATCH = withRole<{ id: string }>("admin:users", async ({ req, params, user }) => {
  const body = await parseJson(req, patchSchema);
  return NextResponse.json({ user: await changePerson(params.id, body, user, req.headers) });
});
