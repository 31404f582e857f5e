// POST /api/cases - file a new removal (field report); GET is the case list (list.ts)
import { NextResponse } from "next/server";
import { z } from "zod";
import { parseJson, withRole } from "@/lib/http/handler";
import { createFieldReport } from "@/lib/cases/service";

export const POST = withRole("case:create", async ({ req, user }) => {
  const created = await createFieldReport(await parseJson(req, z.unknown()), user);
  return NextResponse.json({ case: created }, { status: 201 });
});
