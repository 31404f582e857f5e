// POST /api/cases/:id/transitions - receive, propose, sign, return or reopen (role and stage checked)
import { NextResponse } from "next/server";
import { z } from "zod";
import { transitionCase } from "@/lib/cases/service";
import { badRequest } from "@/lib/http/errors";
import { parseJson, withRole } from "@/lib/http/handler";

export const POST = withRole<{ id: string }>("case:read", async ({ req, params, user }) => {
  const body = await parseJson(req, z.unknown());
  // A signature is never one click: it goes through POST /api/cases/:id/signature with the password.
  if (z.object({ action: z.literal("sign") }).safeParse(body).success) throw badRequest("Sign through the signature step: it shows what you sign and asks for your password.");
  const row = await transitionCase(params.id, body, user);
  return NextResponse.json({ case: row });
});
