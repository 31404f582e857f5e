// GET /api/cases/:id - one case with findings; PATCH - save a section (field, teardown, verdict) at a version
import { NextResponse } from "next/server";
import { z } from "zod";
import { getCaseDetail } from "@/db/queries/case-read";
import { loadReadableCase, saveSection } from "@/lib/cases/service";
import { parseJson, withRole } from "@/lib/http/handler";

export const GET = withRole<{ id: string }>("case:read", async ({ params, user }) => {
  await loadReadableCase(params.id, user);
  return NextResponse.json({ case: await getCaseDetail(params.id) });
});

export const PATCH = withRole<{ id: string }>("case:read", async ({ req, params, user }) => {
  const saved = await saveSection(params.id, await parseJson(req, z.unknown()), user);
  return NextResponse.json({ case: saved });
});
