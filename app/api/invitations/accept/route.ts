// POST /api/invitations/accept - set a password from an invitation link (the token is the credential)
import { NextResponse, type NextRequest } from "next/server";
import { acceptInvitation } from "@/lib/accounts/invite";
import { errorResponse, parseJson } from "@/lib/http/handler";
import { acceptInvitationSchema } from "@/lib/validation/account";

export async function POST(req: NextRequest) {
  try {
    const { token, password } = await parseJson(req, acceptInvitationSchema);
    return NextResponse.json(await acceptInvitation(token, password), { status: 201 });
  } catch (err) {
    return errorResponse(err);
  }
}
