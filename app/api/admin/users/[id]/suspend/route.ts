// POST /api/admin/users/:id/suspend - suspend an account (signs it out everywhere); DELETE - restore it
import { NextResponse } from "next/server";
import { z } from "zod";
import { getUserById } from "@/db/queries/users";
import { auth } from "@/lib/auth/auth";
import { badRequest, notFound } from "@/lib/http/errors";
import { withRole } from "@/lib/http/handler";

const suspendSchema = z.object({ reason: z.string().trim().max(200, "Keep the reason under 200 characters.").optional() });

async function target(id: string) {
  const row = await getUserById(id);
  if (!row) throw notFound("That user");
  return row;
}

export const POST = withRole<{ id: string }>("admin:users", async ({ req, params, user }) => {
  const text = await req.text();
  let body: unknown = {};
  try {
    body = text ? JSON.parse(text) : {};
  } catch {
    throw badRequest("The request body must be JSON.");
  }
  const { reason } = suspendSchema.parse(body);
  const person = await target(params.id);
  if (person.id === user.id) throw badRequest("You cannot suspend your own account; ask another admin.");
  // better-auth marks the account banned and ends its sessions; our own check already ran above.
  await auth.api.banUser({ body: { userId: person.id, banReason: reason || "Suspended by an administrator" }, headers: req.headers });
  return NextResponse.json({ user: { id: person.id, suspended: true } });
});

export const DELETE = withRole<{ id: string }>("admin:users", async ({ req, params }) => {
  const person = await target(params.id);
  await auth.api.unbanUser({ body: { userId: person.id }, headers: req.headers });
  return NextResponse.json({ user: { id: person.id, suspended: false } });
});
