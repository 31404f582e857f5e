// POST /api/cases/:id/transitions - receive, propose, sign, return or reopen (role and stage checked)
import { NextResponse } from "next/server";
import { z } from "zod";
import { transitionCase } from "@/lib/cases/service";
import { ACTIONS, WORKFLOW } from "@/lib/cases/workflow";
import { parseJson } from "@/lib/http/handler";
import { withCase } from "@/lib/http/with-case";

// Which step is in the body; the service checks that step's own permission once it is read.
export const POST = withCase(ACTIONS.map((a) => WORKFLOW[a].permission), async ({ req, case: c, user }) => {
  const row = await transitionCase(c, await parseJson(req, z.unknown()), user);
  return NextResponse.json({ case: row });
});
