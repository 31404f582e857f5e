// PATCH /api/admin/codes/:list/:code - edit label, description, shop words, or retire/restore; DELETE - only if unused
import { NextResponse } from "next/server";
import { deleteCode, editCode, existingCode } from "@/lib/codes/code-service";
import { parseJson, withRole } from "@/lib/http/handler";
import { codePatchSchema, listSchema } from "@/lib/validation/code-entry";

type Params = { list: string; code: string };

export const PATCH = withRole<Params>("admin:codes", async ({ req, params, user }) => {
  const row = await existingCode(listSchema.parse(params.list), params.code);
  const updated = await editCode(row, await parseJson(req, codePatchSchema), user, req.headers);
  return NextResponse.json({ code: updated });
});

export const DELETE = withRole<Params>("admin:codes", async ({ req, params, user }) => {
  const row = await existingCode(listSchema.parse(params.list), params.code);
  await deleteCode(row, user, req.headers);
  return NextResponse.json({ ok: true });
});
