// POST /api/admin/users/:id/suspend - suspend an account (signs it out everywhere); DELETE - restore it
import { NextResponse } from "next/server";
import { z } from "@/lib/validation/zod";
import { getUserById } from "@/db/queries/users";
import { auth } from "@/lib/auth/auth";
import { LastAdminError, suspendIn, withAdminsLocked } from "@/db/queries/admin-guard";
import { badRequest, HttpError, notFound } from "@/lib/http/errors";
import { audit } from "@/lib/security/audit";
import { withRole } from "@/lib/http/handler";
import { JSON_MAX_BYTES, readTextLimited } from "@/lib/http/body";

const suspendSchema = z.object({ reason: z.string().trim().max(200, "Keep the reason under 200 characters.").optional() });

async function target(id: string) {
  const row = await getUserById(id);
  if (!row) throw notFound("That user");
  return row;
}

export const POST = withRole<{ id: string }>("admin:users", async ({ req, params, user }) => {
  const text = await readTextLimited(req, JSON_MAX_BYTES);
  let body: unknown = {};
  try {
    body = text ? JSON.parse(text) : {};
  } catch {
    throw badRequest("The request body must be JSON.");
  }
  const { reason } = suspendSchema.parse(body);
  const person = await target(params.id);
  if (person.id === user.id) throw badRequest("You cannot suspend your own account; ask another admin.");
  // Marked banned and signed out in the same transaction that checks another admin remains.
  try {
    await withAdminsLocked(person.id, true, async (tx) => {
      await suspendIn(tx, person.id, reason || "Suspended by an administrator");
      await audit("suspension", user, { subject: person.email, headers: req.headers, detail: reason ? { reason } : {}, tx });
    });
  } catch (err) {
    if (err instanceof LastAdminError) throw new HttpError(409, "last-admin", "This is the last administrator; make someone else an administrator first.");
    throw err;
  }
  return NextResponse.json({ user: { id: person.id, suspended: true } });
});

export const DELETE = withRole<{ id: string }>("admin:users", async ({ req, params, user }) => {
  const person = await target(params.id);
  await auth.api.unbanUser({ body: { userId: person.id }, headers: req.headers });
  await audit("restoration", user, { subject: person.email, headers: req.headers });
  return NextResponse.json({ user: { id: person.id, suspended: false } });
});
