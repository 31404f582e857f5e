// GET /api/search - free-text and faceted case search with highlighted snippets, held to what the caller may read
import { NextResponse } from "next/server";
import { searchCases } from "@/lib/search/search-service";
import { withRole } from "@/lib/http/handler";
import { parseSearchParams, recordOf } from "@/lib/search/query-schema";

export const GET = withRole("case:read", async ({ req, user }) => {
  const params = parseSearchParams(recordOf(req.nextUrl.searchParams));
  const result = await searchCases(params, user);
  return NextResponse.json({ params, ...result });
});
