// GET /api/admin/sites - every site with its end-play policy and usage; POST - add a site
import { NextResponse } from "next/server";
import { findSiteByCode, insertSite, listSites, siteUsageCounts } from "@/db/queries/sites";
import { badRequest, conflict } from "@/lib/http/errors";
import { parseJson, withRole } from "@/lib/http/handler";
import { audit } from "@/lib/security/audit";
import { DEFAULT_END_PLAY_POLICY } from "@/lib/field/end-play-policy";
import { DEFAULT_PLAUSIBLE_MAX_IN } from "@/lib/field/plausibility";
import { policyOrderProblems, siteCreateSchema } from "@/lib/validation/site";

export const GET = withRole("admin:sites", async () => {
  const [rows, usage] = await Promise.all([listSites(), siteUsageCounts()]);
  return NextResponse.json({ sites: rows.map((s) => ({ ...s, usage: usage.get(s.id) ?? { cases: 0, users: 0 } })) });
});

export const POST = withRole("admin:sites", async ({ req, user }) => {
  const input = await parseJson(req, siteCreateSchema);
  if (await findSiteByCode(input.code)) throw conflict(`A site with the code ${input.code} already exists.`, { fields: { code: "This code is taken." } });
  const order = policyOrderProblems({ endPlayMaxIn: input.endPlayMaxIn ?? DEFAULT_END_PLAY_POLICY.maxIn, plausibleMaxIn: input.plausibleMaxIn ?? DEFAULT_PLAUSIBLE_MAX_IN });
  if (order.plausibleMaxIn) throw badRequest(order.plausibleMaxIn, { fields: order });
  const site = await insertSite(input);
  await audit("site-policy", user, { subject: input.code, headers: req.headers, detail: { action: "add" } });
  return NextResponse.json({ site }, { status: 201 });
});
