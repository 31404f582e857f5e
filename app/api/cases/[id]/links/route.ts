// GET /api/cases/:id/links - related cases; POST - link a case both ways; DELETE ?relatedId= - unlink both ways
import { NextResponse } from "next/server";
import { z } from "@/lib/validation/zod";
import { addCaseLink, listCaseLinks, removeCaseLink } from "@/db/queries/case-links";
import { loadReadableCase } from "@/lib/cases/service";
import { badRequest } from "@/lib/http/errors";
import { parseJson, parseQuery } from "@/lib/http/handler";
import { withCase } from "@/lib/http/with-case";

const caseRef = z.string().trim().min(1, "Name the case to link, by number or id.").max(64);
const linkBody = z.object({ relatedId: caseRef, note: z.string().trim().max(500, "Keep the note under 500 characters.").default("") });
const unlinkQuery = z.object({ relatedId: caseRef });

export const GET = withCase("case:read", async ({ case: c, user }) => {
  return NextResponse.json({ caseId: c.id, links: await listCaseLinks(c.id, user) });
});

export const POST = withCase("case:link", async ({ req, case: c, user }) => {
  const { relatedId, note } = await parseJson(req, linkBody);
  const other = await loadReadableCase(relatedId, user);
  if (other.id === c.id) throw badRequest("A case cannot be linked to itself.");
  await addCaseLink(c, other, note, user);
  return NextResponse.json({ caseId: c.id, links: await listCaseLinks(c.id, user) }, { status: 201 });
});

export const DELETE = withCase("case:link", async ({ req, case: c, user }) => {
  const { relatedId } = parseQuery(req, unlinkQuery);
  const other = await loadReadableCase(relatedId, user);
  await removeCaseLink(c, other, user);
  return NextResponse.json({ caseId: c.id, links: await listCaseLinks(c.id, user) });
});
