// GET /api/cases/:id/history - every change: who, when, what (old -> new), reason
import { NextResponse } from "next/server";
import { listCaseHistory } from "@/db/queries/case-read";
import { loadReadableCase } from "@/lib/cases/service";
import { withRole } from "@/lib/http/handler";

export const GET = withRole<{ id: string }>("case:read", async ({ params, user }) => {
  const c = await loadReadableCase(params.id, user);
  return NextResponse.json({ events: await listCaseHistory(c.id) });
});
