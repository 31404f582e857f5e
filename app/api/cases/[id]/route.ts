// GET /api/cases/:id - one case with findings; PATCH - save a section (field, teardown, verdict) at a version
import { NextResponse } from "next/server";
import { z } from "@/lib/validation/zod";
import { caseDetail, saveSection } from "@/lib/cases/service";
import { SECTION_PERMISSIONS } from "@/lib/cases/workflow";
import { parseJson } from "@/lib/http/handler";
import { withCase } from "@/lib/http/with-case";

export const GET = withCase("case:read", async ({ case: c, user }) => {
  return NextResponse.json({ case: await caseDetail(c.id, user) });
});

export const PATCH = withCase(Object.values(SECTION_PERMISSIONS), async ({ req, case: c, user }) => {
  const saved = await saveSection(c, await parseJson(req, z.unknown()), user);
  return NextResponse.json({ case: saved });
});
