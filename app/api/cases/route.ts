// POST /api/cases - file a new removal (field report); GET /api/cases - the case list, filtered, sorted and paged
import { NextResponse } from "next/server";
import { z } from "@/lib/validation/zod";
import { parseListParams } from "@/lib/cases/list-params";
import { parseJson, withRole } from "@/lib/http/handler";
import { createFieldReport } from "@/lib/cases/service";
import { caseListPage } from "@/lib/cases/list-service";

export const POST = withRole("case:create", async ({ req, user }) => {
  // A device that may send twice (offline outbox, double tap) names the filing with an Idempotency-Key.
  const { row, replayed } = await createFieldReport(await parseJson(req, z.unknown()), user, req.headers.get("idempotency-key"));
  return NextResponse.json({ case: row, replayed }, { status: replayed ? 200 : 201 });
});

// Inspectors get only their shop's cases and their own, whatever the filters say (the list query scopes).
export const GET = withRole("case:read", async ({ req, user }) => {
  const { filters, sort, page, pageSize } = parseListParams(req.nextUrl.searchParams);
  const { rows, total } = await caseListPage(filters, sort, page, pageSize, user);
  return NextResponse.json(
    { rows, total, page, pageSize, pageCount: Math.max(1, Math.ceil(total / pageSize)), sort: `${sort.field}:${sort.dir}` },
    { headers: { "cache-control": "private, no-store" } },
  );
});
