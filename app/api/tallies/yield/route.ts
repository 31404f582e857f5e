// GET /api/tallies/yield - alarm readings, detectors and field calls against teardown, for the Tallies filters
import { NextResponse } from "next/server";
import { parseQuery, withRole } from "@/lib/http/handler";
import { tallyFiltersSchema } from "@/lib/tallies/filters";
import { yieldQuerySchema } from "@/lib/tallies/yield-query";
import { loadYield } from "@/lib/tallies/yield-service";

export const dynamic = "force-dynamic";

export const GET = withRole("tallies:read", async ({ req, user }) => {
  const filters = parseQuery(req, tallyFiltersSchema);
  const { miss } = parseQuery(req, yieldQuerySchema);
  // The query layer holds inspectors to their own shop and their own calls whatever the filters say.
  const data = await loadYield(filters, user, miss);
  return NextResponse.json(data, { headers: { "cache-control": "private, no-store" } });
});
