// POST /api/admin/users/:id/unlock - lift a sign-in lockout after repeated failures
import { NextResponse } from "next/server";
import { unlockPerson } from "@/lib/accounts/people-service";
import { withRole } from "@/lib/http/handler";

export const POST = withRole<{ id: string }>("admin:users", async ({ req, params, user }) => {
  const person = await unlockPerson(params.id, user, req.headers);
  return NextResponse.json({ user: { id: person.id, locked: false } });
});
