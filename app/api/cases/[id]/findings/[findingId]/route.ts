// PATCH /api/cases/:id/findings/:findingId - change a finding; DELETE - remove it (?version=N)
import { NextResponse } from "next/server";
import { z } from "@/lib/validation/zod";
import { editCaseFinding, removeCaseFinding } from "@/lib/cases/service";
import { parseJson, parseQuery } from "@/lib/http/handler";
import { withCase } from "@/lib/http/with-case";

type P = { id: string; findingId: string };

export const PATCH = withCase<P>("case:edit-teardown", async ({ req, params, case: c, user }) => {
  return NextResponse.json(await editCaseFinding(c, params.findingId, await parseJson(req, z.unknown()), user));
});

export const DELETE = withCase<P>("case:edit-teardown", async ({ req, params, case: c, user }) => {
  const { version } = parseQuery(req, z.object({ version: z.coerce.number().int().positive("Send ?version= of the case you edited.") }));
  return NextResponse.json(await removeCaseFinding(c, params.findingId, version, user));
});
