// POST /api/cases/:id/transitions - receive, propose, sign, return or reopen (role and stage checked)
import { NextResponse } from "next/server";
import { z } from "zod";
import { transitionCase } from "@/lib/cases/service";
import { parseJson, withRole } from "@/lib/http/handler";

export const POST = withRole<{ id: string }>("case:read", async ({ req, params, user }) => {
  const row = await transitionCase(params.id, await parseJson(req, z.unknown()), user);
  return NextResponse.json({ case: row });
});
