// GET /api/admin/codes?list= - a classification list with retired codes and usage; POST - add a code
import { NextResponse } from "next/server";
import { z } from "@/lib/validation/zod";
import { addCode, codesWithUsage } from "@/lib/codes/code-service";
import { parseJson, parseQuery, withRole } from "@/lib/http/handler";
import { codeCreateSchema, listSchema } from "@/lib/validation/code-entry";

export const GET = withRole("admin:codes", async ({ req }) => {
  const { list } = parseQuery(req, z.object({ list: listSchema }));
  return NextResponse.json({ codes: await codesWithUsage(list) });
});

export const POST = withRole("admin:codes", async ({ req, user }) => {
  const row = await addCode(await parseJson(req, codeCreateSchema), user, req.headers);
  return NextResponse.json({ code: row }, { status: 201 });
});
