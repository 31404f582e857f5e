// GET /api/cases/:id/similar - the ten most similar earlier cases the caller may read, with scores and reasons
import { NextResponse } from "next/server";
import { similarCases } from "@/lib/cases/similar-service";
import { withCase } from "@/lib/http/with-case";

export const GET = withCase("case:read", async ({ case: c, user }) => {
  return NextResponse.json({ caseId: c.id, number: c.number, similar: await similarCases(c, user) });
});
