// POST /api/cases/:id/findings - add a teardown finding at the case's current version
import { NextResponse } from "next/server";
import { z } from "zod";
import { addCaseFinding } from "@/lib/cases/service";
import { parseJson, withRole } from "@/lib/http/handler";

export const POST = withRole<{ id: string }>("case:edit-teardown", async ({ req, params, user }) => {
  const result = await addCaseFinding(params.id, await parseJson(req, z.unknown()), user);
  return NextResponse.json(result, { status: 201 });
});
