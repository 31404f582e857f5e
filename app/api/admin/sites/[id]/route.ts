// PATCH /api/admin/sites/:id - edit a site, its end-play policy or active flag; DELETE - only an unused site
import { NextResponse } from "next/server";
import { z } from "@/lib/validation/zod";
import { deleteSite, findSiteByCode, getSite, siteUsage, updateSite } from "@/db/queries/sites";
import { badRequest, conflict, notFound } from "@/lib/http/errors";
import { parseJson, withRole } from "@/lib/http/handler";
import { audit } from "@/lib/security/audit";
import { policyOrderProblems, sitePatchSchema } from "@/lib/validation/site";

const idSchema = z.string().uuid("Site id must be a UUID.");

export const PATCH = withRole<{ id: string }>("admin:sites", async ({ req, params, user }) => {
  const id = idSchema.parse(params.id);
  const input = await parseJson(req, sitePatchSchema);
  const site = await getSite(id);
  if (!site) throw notFound("That site");
  if (input.code && input.code !== site.code && (await findSiteByCode(input.code))) {
    throw conflict(`A site with the code ${input.code} already exists.`, { fields: { code: "This code is taken." } });
  }
  const order = policyOrderProblems({ endPlayMaxIn: input.endPlayMaxIn ?? site.endPlayMaxIn, plausibleMaxIn: input.plausibleMaxIn ?? site.plausibleMaxIn });
  if (order.plausibleMaxIn) throw badRequest(order.plausibleMaxIn, { fields: order });
  const updated = await updateSite(id, input);
  await audit("site-policy", user, { subject: site.code, headers: req.headers, detail: { changed: Object.keys(input) } });
  return NextResponse.json({ site: updated });
});

export const DELETE = withRole<{ id: string }>("admin:sites", async ({ params }) => {
  const id = idSchema.parse(params.id);
  const site = await getSite(id);
  if (!site) throw notFound("That site");
  const usage = await siteUsage(id);
  const uses = [
    usage.cases && `${usage.cases} ${usage.cases === 1 ? "case" : "cases"}`,
    usage.users && `${usage.users} ${usage.users === 1 ? "person" : "people"}`,
    usage.invitations && `${usage.invitations} ${usage.invitations === 1 ? "invitation" : "invitations"}`,
  ].filter(Boolean);
  if (uses.length) {
    throw conflict(`${site.code} is used by ${uses.join(", ")}, so it cannot be deleted. Mark it inactive instead.`, { usage });
  }
  try {
    await deleteSite(id);
  } catch (err) {
    // A case filed between the check and the delete still holds the site (foreign key).
    const pgCode = (err as { code?: string; cause?: { code?: string } }).cause?.code ?? (err as { code?: string }).code;
    if (pgCode === "23503") throw conflict(`${site.code} came into use just now; mark it inactive instead.`);
    throw err;
  }
  return NextResponse.json({ ok: true });
});
