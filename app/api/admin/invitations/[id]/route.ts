// DELETE /api/admin/invitations/:id - withdraw a pending invitation
import { NextResponse } from "next/server";
import { z } from "@/lib/validation/zod";
import { withdrawInvitation } from "@/lib/accounts/invite";
import { withRole } from "@/lib/http/handler";

export const DELETE = withRole<{ id: string }>("admin:users", async ({ params }) => {
  const id = z.string().uuid("Invitation id must be a UUID.").parse(params.id);
  await withdrawInvitation(id);
  return NextResponse.json({ ok: true });
});
