// POST /api/cases/:id/transitions - receive, propose, return or reopen (role and stage checked); signing has its own step
import { NextResponse } from "next/server";
import { z } from "@/lib/validation/zod";
import { transitionCase } from "@/lib/cases/service";
import { ACTIONS, WORKFLOW } from "@/lib/cases/workflow";
import { badRequest } from "@/lib/http/errors";
import { parseJson } from "@/lib/http/handler";
import { withCase } from "@/lib/http/with-case";

// Which step is in the body; the service checks that step's own permission once it is read.
export const POST = withCase(
  ACTIONS.map((a) => WORKFLOW[a].permission),
  async ({ req, case: c, user }) => {
    const body = await parseJson(req, z.unknown());
    // A signature is never one click: it goes through POST /api/cases/:id/signature with the password.
    if (z.object({ action: z.literal("sign") }).safeParse(body).success)
      throw badRequest("Sign through the signature step: it shows what you sign and asks for your password.");
    const row = await transitionCase(c, body, user);
    return NextResponse.json({ case: row });
  },
);
