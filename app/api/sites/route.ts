// GET /api/sites - the sites for forms' pickers (any signed-in person; no policy details)
import { NextResponse } from "next/server";
import { siteChoices } from "@/lib/sites/site-service";
import { withRole } from "@/lib/http/handler";

export const GET = withRole(null, async () => NextResponse.json({ sites: await siteChoices() }));
