// GET /api/tallies/life - Weibull life per root cause (months or miles) for the given filters
import { NextResponse } from "next/server";
import { z } from "@/lib/validation/zod";
import { loadLife } from "@/lib/tallies/life-service";
import { parseQuery, withRole } from "@/lib/http/handler";
import { tallyFiltersSchema } from "@/lib/tallies/filters";

export const dynamic = "force-dynamic";

const lifeQuery = z.object({
  measure: z.enum(["months", "miles"]).default("months"),
  cause: z.string().max(60).optional(),
});

export const GET = withRole("tallies:read", async ({ req, user }) => {
  const filters = parseQuery(req, tallyFiltersSchema);
  const { measure, cause } = parseQuery(req, lifeQuery);
  const data = await loadLife(filters, user, measure, cause);
  return NextResponse.json(data, { headers: { "cache-control": "private, no-store" } });
});
