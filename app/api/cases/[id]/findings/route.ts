// POST /api/cases/:id/findings - add a teardown finding at the case's current version
import { NextResponse } from "next/server";
import { z } from "@/lib/validation/zod";
import { addCaseFinding } from "@/lib/cases/service";
import { parseJson } from "@/lib/http/handler";
import { withCase } from "@/lib/http/with-case";

export const POST = withCase("case:edit-teardown", async ({ req, case: c, user }) => {
  const result = await addCaseFinding(c, await parseJson(req, z.unknown()), user);
  return NextResponse.json(result, { status: 201 });
});
