// GET /api/cases/:id/links - related cases; POST - link a case both ways; DELETE ?relatedId= - unlink both ways
import { NextResponse } from "next/server";
import { z } from "@/lib/validation/zod";
import { caseLinks, linkCase, unlinkCase } from "@/lib/cases/links-service";
import { parseJson, parseQuery } from "@/lib/http/handler";
import { withCase } from "@/lib/http/with-case";

const caseRef = z.string().trim().min(1, "Name the case to link, by number or id.").max(64);
const linkBody = z.object({ relatedId: caseRef, note: z.string().trim().max(500, "Keep the note under 500 characters.").default("") });
const unlinkQuery = z.object({ relatedId: caseRef });

export const GET = withCase("case:read", async ({ case: c, user }) => {
  return NextResponse.json({ caseId: c.id, links: await caseLinks(c, user) });
});

export const POST = withCase("case:link", async ({ req, case: c, user }) => {
  const { relatedId, note } = await parseJson(req, linkBody);
  return NextResponse.json({ caseId: c.id, links: await linkCase(c, relatedId, note, user) }, { status: 201 });
});

export const DELETE = withCase("case:link", async ({ req, case: c, user }) => {
  const { relatedId } = parseQuery(req, unlinkQuery);
  return NextResponse.json({ caseId: c.id, links: await unlinkCase(c, relatedId, user) });
});
