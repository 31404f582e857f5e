// PATCH /api/cases/:id/findings/:findingId - change a finding; DELETE - remove it (?version=N)
import { NextResponse } from "next/server";
import { z } from "zod";
import { editCaseFinding, removeCaseFinding } from "@/lib/cases/service";
import { parseJson, parseQuery, withRole } from "@/lib/http/handler";

type P = { id: string; findingId: string };

export const PATCH = withRole<P>("case:edit-teardown", async ({ req, params, user }) => {
  return NextResponse.json(await editCaseFinding(params.id, params.findingId, await parseJson(req, z.unknown()), user));
});

export const DELETE = withRole<P>("case:edit-teardown", async ({ req, params, user }) => {
  const { version } = parseQuery(req, z.object({ version: z.coerce.number().int().positive("Send ?version= of the case you edited.") }));
  return NextResponse.json(await removeCaseFinding(params.id, params.findingId, version, user));
});
