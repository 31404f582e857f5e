// POST /api/admin/users/:id/unlock - lift a sign-in lockout after repeated failures
import { NextResponse } from "next/server";
import { getUserById } from "@/db/queries/users";
import { clearCounter } from "@/db/queries/sign-in-failures";
import { notFound } from "@/lib/http/errors";
import { withRole } from "@/lib/http/handler";
import { audit } from "@/lib/security/audit";
import { accountKey } from "@/lib/security/sign-in-rules";

export const POST = withRole<{ id: string }>("admin:users", async ({ req, params, user }) => {
  const person = await getUserById(params.id);
  if (!person) throw notFound("That user");
  await clearCounter(accountKey(person.email));
  await audit("account-unlocked", user, { subject: person.email, headers: req.headers });
  return NextResponse.json({ user: { id: person.id, locked: false } });
});
