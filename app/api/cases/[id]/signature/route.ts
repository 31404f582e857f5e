// GET /api/cases/:id/signature - what a signature covers now (hash) and, once signed, whether it still matches
// POST /api/cases/:id/signature - sign the verdict: password again, meaning confirmed, hash of what was shown
import { NextResponse } from "next/server";
import { z } from "@/lib/validation/zod";
import { SIGNATURE_MEANING, contentHash } from "@/lib/cases/signature-content";
import { checkSignature, contentOf, signCase } from "@/lib/cases/signature-service";
import { parseJson } from "@/lib/http/handler";
import { withCase } from "@/lib/http/with-case";

export const GET = withCase("case:read", async ({ case: c }) => {
  const content = await contentOf(c);
  return NextResponse.json({
    meaning: SIGNATURE_MEANING,
    contentHash: contentHash(content),
    content,
    version: c.version,
    signature: await checkSignature(c),
  });
});

export const POST = withCase("case:sign", async ({ req, case: c, user }) => {
  const row = await signCase(c, await parseJson(req, z.unknown()), user);
  return NextResponse.json({
    case: { id: row.id, number: row.number, status: row.status, version: row.version, signedContentHash: row.signedContentHash },
  });
});
