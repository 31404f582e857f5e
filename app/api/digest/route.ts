// POST /api/digest - send the weekly digest to managers now (admins only)
import { NextResponse } from "next/server";
import { z } from "@/lib/validation/zod";
import { badRequest } from "@/lib/http/errors";
import { withRole } from "@/lib/http/handler";
import { JSON_MAX_BYTES, readTextLimited } from "@/lib/http/body";
import { sendDigest } from "@/lib/digest/send";

export const dynamic = "force-dynamic";

// Nothing to choose: the body may be empty or an empty JSON object.
const body = z.object({}).strict();

export const POST = withRole("digest:send", async ({ req }) => {
  const text = (await readTextLimited(req, JSON_MAX_BYTES)).trim();
  if (text) {
    let json: unknown;
    try {
      json = JSON.parse(text);
    } catch {
      throw badRequest("The request body must be empty or JSON.");
    }
    body.parse(json);
  }
  const sent = await sendDigest();
  return NextResponse.json(sent, { status: 202 });
});
