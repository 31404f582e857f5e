// DELETE /api/admin/invitations/:id - withdraw a pending invitation
import { NextResponse } from "next/server";
import { z } from "@/lib/validation/zod";
import { revokeInvitation } from "@/db/queries/invitations";
import { notFound } from "@/lib/http/errors";
import { withRole } from "@/lib/http/handler";

export const DELETE = withRole<{ id: string }>("admin:users", async ({ params }) => {
  const id = z.string().uuid("Invitation id must be a UUID.").parse(params.id);
  if (!(await revokeInvitation(id))) throw notFound("A pending invitation with that id");
  return NextResponse.json({ ok: true });
});
