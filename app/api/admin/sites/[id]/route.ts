// PATCH /api/admin/sites/:id - edit a site, its end-play policy or active flag; DELETE - only an unused site
import { NextResponse } from "next/server";
import { z } from "@/lib/validation/zod";
import { parseJson, withRole } from "@/lib/http/handler";
import { editSite, removeSite } from "@/lib/sites/site-service";
import { sitePatchSchema } from "@/lib/validation/site";

const idSchema = z.string().uuid("Site id must be a UUID.");

export const PATCH = withRole<{ id: string }>("admin:sites", async ({ req, params, user }) => {
  const id = idSchema.parse(params.id);
  const input = await parseJson(req, sitePatchSchema);
  return NextResponse.json({ site: await editSite(id, input, user, req.headers) });
});

export const DELETE = withRole<{ id: string }>("admin:sites", async ({ params }) => {
  await removeSite(idSchema.parse(params.id));
  return NextResponse.json({ ok: true });
});
