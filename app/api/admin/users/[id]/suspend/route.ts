// POST /api/admin/users/:id/suspend - suspend an account (signs it out everywhere); DELETE - restore it
import { NextResponse } from "next/server";
import { z } from "@/lib/validation/zod";
import { restorePerson, suspendPerson } from "@/lib/accounts/people-service";
import { badRequest } from "@/lib/http/errors";
import { withRole } from "@/lib/http/handler";
import { JSON_MAX_BYTES, readTextLimited } from "@/lib/http/body";

const suspendSchema = z.object({ reason: z.string().trim().max(200, "Keep the reason under 200 characters.").optional() });

export const POST = withRole<{ id: string }>("admin:users", async ({ req, params, user }) => {
  const text = await readTextLimited(req, JSON_MAX_BYTES);
  let body: unknown = {};
  try {
    body = text ? JSON.parse(text) : {};
  } catch {
    throw badRequest("The request body must be JSON.");
  }
  const { reason } = suspendSchema.parse(body);
  const person = await suspendPerson(params.id, reason, user, req.headers);
  return NextResponse.json({ user: { id: person.id, suspended: true } });
});

export const DELETE = withRole<{ id: string }>("admin:users", async ({ req, params, user }) => {
  const person = await restorePerson(params.id, user, req.headers);
  return NextResponse.json({ user: { id: person.id, suspended: false } });
});
