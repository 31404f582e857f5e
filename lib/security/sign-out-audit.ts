// Records a sign-out with the person it ended (the session is gone once better-auth answers).
import "server-only";
import { auth } from "@/lib/auth/auth";
import { audit } from "./audit";

type Handler = (req: Request) => Promise<Response>;

export function auditSignOut(handler: Handler): Handler {
  return async (req) => {
    if (!new URL(req.url).pathname.endsWith("/sign-out")) return handler(req);
    const session = await auth.api.getSession({ headers: req.headers }).catch(() => null);
    const res = await handler(req);
    if (res.ok && session)
      await audit("sign-out", { id: session.user.id, email: session.user.email }, { subject: session.user.email, headers: req.headers });
    return res;
  };
}
