// GET /api/admin/sites - every site with its end-play policy and usage; POST - add a site
import { NextResponse } from "next/server";
import { parseJson, withRole } from "@/lib/http/handler";
import { addSite, sitesWithUsage } from "@/lib/sites/site-service";
import { siteCreateSchema } from "@/lib/validation/site";

export const GET = withRole("admin:sites", async () => NextResponse.json({ sites: await sitesWithUsage() }));

export const POST = withRole("admin:sites", async ({ req, user }) => {
  const site = await addSite(await parseJson(req, siteCreateSchema), user, req.headers);
  return NextResponse.json({ site }, { status: 201 });
});
