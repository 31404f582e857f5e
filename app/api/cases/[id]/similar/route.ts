// GET /api/cases/:id/similar - the ten most similar earlier cases the caller may read, with scores and reasons
import { NextResponse } from "next/server";
import { findSimilarCases } from "@/db/queries/similar";
import { loadReadableCase } from "@/lib/cases/service";
import { withRole } from "@/lib/http/handler";

export const GET = withRole<{ id: string }>("case:read", async ({ params, user }) => {
  const c = await loadReadableCase(params.id, user);
  return NextResponse.json({ caseId: c.id, number: c.number, similar: await findSimilarCases(c.id, user) });
});
