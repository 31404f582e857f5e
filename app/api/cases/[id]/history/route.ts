// GET /api/cases/:id/history - every change: who, when, what (old -> new), reason
import { NextResponse } from "next/server";
import { readableHistory } from "@/lib/cases/service";
import { withCase } from "@/lib/http/with-case";

export const GET = withCase("case:read", async ({ case: c, user }) => {
  return NextResponse.json({ events: await readableHistory(c.id, user) });
});
