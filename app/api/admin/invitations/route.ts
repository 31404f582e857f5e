// GET /api/admin/invitations - pending invitations; POST - invite a person by e-mail
import { NextResponse } from "next/server";
import { inviteUser, pendingInvitations } from "@/lib/accounts/invite";
import { parseJson, withRole } from "@/lib/http/handler";
import { audit } from "@/lib/security/audit";
import { inviteSchema } from "@/lib/validation/account";

export const GET = withRole("admin:users", async () => NextResponse.json({ invitations: await pendingInvitations() }));

export const POST = withRole("admin:users", async ({ req, user }) => {
  const input = await parseJson(req, inviteSchema);
  const invitation = await inviteUser(input, user);
  await audit("invitation", user, { subject: input.email, headers: req.headers, detail: { role: input.role } });
  return NextResponse.json({ invitation }, { status: 201 });
});
