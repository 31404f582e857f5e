// GET /api/tallies - every tally for the given filters (period, site, class, trigger, recurrence settings)
import { NextResponse } from "next/server";
import { loadTallies } from "@/lib/tallies/tallies-service";
import { parseQuery, withRole } from "@/lib/http/handler";
import { tallyFiltersSchema } from "@/lib/tallies/filters";

export const dynamic = "force-dynamic";

export const GET = withRole("tallies:read", async ({ req, user }) => {
  const filters = parseQuery(req, tallyFiltersSchema);
  // The query layer limits inspectors to their own site whatever the filters say.
  const data = await loadTallies(filters, user);
  return NextResponse.json(data, { headers: { "cache-control": "private, no-store" } });
});
